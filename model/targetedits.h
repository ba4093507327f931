#pragma once
// Edits of a season's targets that are computed from what is stored: carrying one season's
// targets into the next, and undoing an edit. Both come back as new versions to store with
// ClubRepository::addTargets; history is never rewritten.

#include "targets.h"

#include <string>
#include <vector>

namespace pitchloop::model {

/// The season before / after a season name ("2026-27" → "2025-26" / "2027-28"); empty when
/// `season` is not a season name.
std::string previousSeason(const std::string& season);
std::string nextSeason(const std::string& season);

/// First and last day of a season under the July–June convention ("2026-07-01",
/// "2027-06-30"); empty when `season` is not a season name.
std::string seasonStart(const std::string& season);
std::string seasonEnd(const std::string& season);

/// New versions that carry the targets of `fromSeason` in force on its last day into
/// `toSeason`, in force from its first day: same zone, direction, value, margin and minimum
/// sample; `author` wrote them; the rationale says where they came from and keeps the old one.
/// `from` holds the stored versions of `fromSeason` (others are ignored); retired targets are
/// not carried. recordedAt is left empty (addTargets stamps it).
std::vector<Target> copySeasonTargets(const std::vector<Target>& from, const std::string& fromSeason,
                                      const std::string& toSeason, const std::string& author);

/// New versions that undo `added`, versions just stored on top of `before` (every version stored
/// before them, any keys): for each added key and date, the version that was in force on that
/// date before the edit is written again from that date; where none was, a retirement from that
/// date. Written by `author` with `rationale`, recorded at `now` — or later, at the undone
/// version's own recordedAt when that is later, so that the undo wins every tie in inForce.
std::vector<Target> revertVersions(const std::vector<Target>& before, const std::vector<Target>& added,
                                   const std::string& author, const std::string& rationale,
                                   const std::string& now);

} // namespace pitchloop::model
