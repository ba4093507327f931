#pragma once
// Gathers a planner request from the club file (docs/planner.md): the squad's fixtures, the
// open focuses ranked from the flags of the last match before the session, the drill book,
// the previous day's drills and the intensity caps. The command line and the desktop app
// plan from the same request.

#include "planner.h"

#include <string>
#include <vector>

namespace pitchloop::model {

class ClubRepository;

/// The open focuses of a squad's season as the planner sees them: flag numbers in the club's
/// judged window at the last match of the season before `date`. Focuses left out (no match
/// yet, metric gone, no target in their zones) are explained in `notes`.
std::vector<PlanFocus> openPlanFocuses(ClubRepository& repo, const std::string& squad,
                                       const std::string& season, const std::string& date,
                                       std::vector<std::string>& notes);

/// Zones that are off target or likely off at that match and that no open focus covers, as
/// planner focuses (watched, id 0) at half their severity, the most severe `most` of them.
std::vector<PlanFocus> watchedPlanFocuses(ClubRepository& repo, const std::string& squad,
                                          const std::string& season, const std::string& date,
                                          const std::vector<PlanFocus>& open, std::size_t most = 3);

/// A request for the squad's session on `date` (fixtures, focuses, drills, yesterday's
/// drills, caps); `minutes` and `players` as given. A date that is not a calendar date leaves
/// the dated parts empty, and planSession reports it.
PlanRequest planRequestFor(ClubRepository& repo, const std::string& squad,
                           const std::string& date, int minutes, int players,
                           std::vector<std::string>& notes);

} // namespace pitchloop::model
