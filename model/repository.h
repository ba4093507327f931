#pragma once
// The club file: one SQLite database per club holding squads, seasons, matches, their events,
// metric definitions and per-match zone tallies (docs/storage.md).

#include "countscale.h"
#include "metricengine.h"
#include "metricspec.h"
#include "squadlist.h"
#include "status.h"
#include "targets.h"
#include "types.h"
#include "zones.h"

#include <cstdint>
#include <filesystem>
#include <functional>
#include <map>
#include <memory>
#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace SQLite {
class Database;
}

namespace pitchloop::model {

/// Where a stored match came from, to recognise a re-ingest of the same file.
struct SourceFile {
    std::string name;  ///< file name as given
    std::string hash;  ///< FNV-1a 64 of the bytes, hex
    std::string ingestedAt; ///< ISO 8601 UTC time of ingest
};

struct MatchSummary {
    std::string id;
    std::string date;
    std::string competition;
    std::string venue;
    std::string opponent;
    std::optional<int> goalsUs;
    std::optional<int> goalsOpp;
    std::string squad;
    std::string season;
    Pitch pitch;
    int eventCount = 0;
    SourceFile source;
    std::string zoneOnlyGrid; ///< zone-only data: the grid its positions are known to; else empty

    /// zonesKnownOn and zoneOnlyNote (metricengine.h) for the stored match.
    bool zonesKnownOn(const ZoneGrid& grid) const;
    std::string zoneOnlyNote(const ZoneGrid& grid) const;
};

struct TallyRow {
    std::string matchId;
    std::string metricId;
    int band = 0;
    int lane = 0;
    long num = 0;
    long den = 0;
};

/// Owns the SQLite connection; returns domain structs. Throws StorageError on faults.
class ClubRepository {
public:
    static constexpr int kSchemaVersion = 11;

    /// Opens (creating when missing) and migrates the club file. ":memory:" works for tests.
    explicit ClubRepository(const std::string& file);
    ~ClubRepository();
    ClubRepository(const ClubRepository&) = delete;
    ClubRepository& operator=(const ClubRepository&) = delete;

    int schemaVersion() const;
    std::string clubName() const; ///< empty until the first match names it
    ZoneGrid tallyGrid() const;

    // Metrics --------------------------------------------------------------------------
    std::vector<MetricSpec> metrics() const;
    std::optional<MetricSpec> metric(const std::string& id) const;
    /// Adds or replaces a metric and recomputes its tallies for every stored match, in one
    /// transaction. Built-in metrics cannot be replaced by user metrics of the same id.
    void saveMetric(const MetricSpec& spec);
    bool removeMetric(const std::string& id);

    // Matches --------------------------------------------------------------------------
    std::optional<SourceFile> sourceOf(const std::string& matchId) const;
    std::vector<MatchSummary> matches() const;
    std::optional<MatchSummary> matchSummary(const std::string& matchId) const;
    std::optional<Match> loadMatch(const std::string& matchId) const;

    /// Stores a match with its events and tallies in one transaction, replacing a stored
    /// match of the same id when `replace` (the caller decides whether that is allowed).
    void storeMatch(const Match& match, const SourceFile& source, const std::string& squad,
                    bool replace);

    // Tallies --------------------------------------------------------------------------
    /// Stored tallies with a non-zero denominator, ordered by match date, id, metric, zone.
    std::vector<TallyRow> tallies(const std::optional<std::string>& matchId = std::nullopt,
                                  const std::optional<std::string>& metricId = std::nullopt) const;
    /// The same on another grid, computed from the stored events (nothing is stored).
    std::vector<TallyRow> talliesOnGrid(const ZoneGrid& grid,
                                        const std::optional<std::string>& matchId,
                                        const std::optional<std::string>& metricId) const;
    /// One match's tally for one metric, dense over the stored grid.
    MatchTally matchTally(const std::string& matchId, const std::string& metricId) const;
    /// Recomputes stored tallies from stored events (all metrics, or one).
    void recomputeTallies(const std::optional<std::string>& metricId = std::nullopt);

    // Seasons and targets --------------------------------------------------------------
    /// (squad, season) of a stored match.
    std::optional<std::pair<std::string, std::string>> seasonOfMatch(const std::string& matchId) const;
    /// Seasons of a squad, oldest first.
    std::vector<std::string> seasons(const std::string& squad) const;
    /// Makes the squad and season when missing (season names like "2026-27").
    void ensureSeason(const std::string& squad, const std::string& season);
    /// Every stored target version of a season (all metrics and zones), oldest first.
    std::vector<Target> targets(const std::string& squad, const std::string& season) const;
    /// Every stored target version in the club file, on `grid` (the club's grid when not
    /// given) or for the whole pitch. Versions set on another grid stay stored; targets()
    /// leaves them out as well.
    std::vector<Target> allTargets(const std::optional<ZoneGrid>& grid = std::nullopt) const;
    /// Records new target versions in one transaction; never changes an existing version.
    /// `recordedAt` is filled with `now` when empty. Returns their version ids.
    std::vector<std::int64_t> addTargets(const std::vector<Target>& versions,
                                         const std::string& now);

    /// The season of a match up to its last stored match: match ids and dates in date order,
    /// and dense tallies per metric; `focal` is set to the match's index.
    SeasonTallies seasonTallies(const std::string& squad, const std::string& season) const;
    /// Where each period of a match's video starts, in seconds from the video's start, as the
    /// staff last gave it for clip lists (moments.h VideoClock); empty when never given.
    std::map<int, double> videoPeriodStarts(const std::string& matchId) const;
    void saveVideoPeriodStarts(const std::string& matchId, const std::map<int, double>& starts);
    /// The squad's list of players (squadlist.h), by shirt number; empty when none was given.
    std::vector<Player> squadList(const std::string& squad) const;
    /// Replaces the squad's list in one transaction (the squad is created when new). The caller
    /// checks the players first (parseSquadList, checkPlayer).
    void replaceSquadList(const std::string& squad, const std::vector<Player>& players);
    /// Each match's minutes played and the opponent's passes, in seasonTallies' match order
    /// (for count maps read per 90 minutes or per 100 of their passes; countscale.h).
    std::vector<MatchExposure> seasonExposures(const std::string& squad, const std::string& season) const;
    /// The same on `grid`: the stored tallies when it is the club's grid, else counted from
    /// the stored events (a focus opened on an earlier grid is reviewed on its own zones).
    SeasonTallies seasonTallies(const std::string& squad, const std::string& season,
                                const ZoneGrid& grid) const;

    /// Flag settings stored in the club file (defaults where unset).
    FlagSettings flagSettings() const;
    /// Writes the flag settings and, in the same transaction, the `more` settings given as
    /// key and value (e.g. FixtureStore::capsSetting), so a settings page saves all or nothing.
    void saveFlagSettings(const FlagSettings& settings,
                          const std::vector<std::pair<std::string, std::string>>& more = {});

    /// Moves the club to another zone grid in one transaction (docs/storage.md, "Changing
    /// the zone grid"): every match's tallies are counted again on `to`, per-zone target
    /// versions are carried to the zones of `to` that have none there yet (carryTargets), the
    /// setting changes and a grid_change row records who did it. Focuses keep the grid they
    /// were opened on and drill zones are read on the club's grid (both store their grid).
    /// `progress(done, total)` is called after each match. Returns the number of target
    /// versions carried. Changing to the grid in use does nothing and returns 0.
    int changeGrid(const ZoneGrid& to, const std::string& by, const std::string& now,
                   const std::function<void(int, int)>& progress = {});
    /// Grid changes so far, oldest first.
    struct GridChange {
        std::string from;
        std::string to;
        std::string by;
        std::string at;
        std::string summary;
    };
    std::vector<GridChange> gridChanges() const;

    /// Online backup of the whole club file to `target`.
    void backupTo(const std::string& target) const;

    /// The connection, for the stores that share this club file (drill book, focuses). They
    /// run their own statements and transactions on it; nothing else should.
    SQLite::Database& database() { return *m_db; }

    /// Applies migrations 1..`version` to a database (tests use it to build old files).
    static void migrate(SQLite::Database& db, int version);

private:
    void writeTallies(std::int64_t matchRowId, const Match& match,
                      const std::vector<MetricSpec>& specs);
    std::vector<std::int64_t> insertTargets(const std::vector<Target>& versions,
                                            const std::string& now);
    std::unique_ptr<SQLite::Database> m_db;
};

/// FNV-1a 64-bit hash of bytes as 16 hex digits (identity of a source file, not security).
std::string contentHash(std::string_view bytes);

/// The season a date falls in under the July–June convention, e.g. "2026-27".
std::string seasonOf(const std::string& isoDate);

} // namespace pitchloop::model
