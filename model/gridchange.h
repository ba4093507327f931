#pragma once
// Changing a club's zone grid (docs/storage.md, "Changing the zone grid"): what happens to the
// records that name zones, and a preview of it in plain words before anything is written.

#include "targets.h"
#include "zones.h"

#include <string>
#include <vector>

namespace pitchloop::model {

class ClubRepository;

/// Target versions to write on `to` when the club moves there from `from`.
struct TargetCarry {
    std::vector<Target> versions; ///< new versions on `to`, in the order to store them
    int zonesCarried = 0;         ///< (season, metric, zone of `to`) given targets
    int zonesKept = 0;            ///< zones of `to` whose earlier versions come back
};

/// For every squad, season and metric with per-zone targets on `from` (`onFrom`), each zone
/// of `to` lying at least half inside zones with targets takes every version of the one of
/// them covering most of it (the lower index on a tie), with that version's author, dates and
/// retirement, and a note added to its rationale (the same one-half rule as mapZones).
/// A season's metric that already has per-zone versions on `to` (`onTo`, set during an
/// earlier time on that grid) takes nothing: those come back as they were, so moving back to a
/// grid restores its targets exactly.
/// Whole-pitch targets belong to no grid and are left alone.
TargetCarry carryTargets(const std::vector<Target>& onFrom, const std::vector<Target>& onTo,
                         const ZoneGrid& from, const ZoneGrid& to);

/// What changing to `to` would do, counted on the club file without writing anything.
struct GridChangePreview {
    ZoneGrid from;
    ZoneGrid to;
    int matches = 0;             ///< matches whose tallies are counted again
    TargetCarry targets;
    int focusesOnOtherGrids = 0; ///< focuses that will be reviewed on the grid they were opened on
    int drillsWithZones = 0;     ///< drill notes whose zones will be read on `to`
    /// Zone-only matches whose zones `to` cannot know (zonesKnownOn): their zone tallies are
    /// left out on `to`, one line each in `lines`.
    std::vector<std::string> zoneOnlyLeftOut;
    std::vector<std::string> lines; ///< the above in plain words, one point a line
};
GridChangePreview previewGridChange(ClubRepository& repo, const ZoneGrid& to);

} // namespace pitchloop::model
