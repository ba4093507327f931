#pragma once
// Storage of fixtures and planned training sessions in the club file (tables fixture, session,
// session_block, session_focus; docs/planner.md). Storage faults throw StorageError.

#include "fixtures.h"
#include "planner.h"
#include "problem.h"

#include <cstdint>
#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace pitchloop::model {

class ClubRepository;

/// What an import of fixtures did. With any problem nothing was written.
struct FixtureImport {
    int added = 0;
    int updated = 0; ///< a fixture on the same date whose kick-off, opponent, ... changed
    int unchanged = 0;
    int linked = 0; ///< fixtures newly linked to a stored match of the same date
    Problems errors;
};

/// A squad's fixtures, stored per season (one a date), linked to the match played that day.
class FixtureStore {
  public:
    explicit FixtureStore(ClubRepository& repo) : m_repo(repo) {}

    /// Adds the fixtures to the squad's seasons (each by its date, July–June), replacing the
    /// fixture of the same date, in one transaction; validated first (problems name `source`).
    FixtureImport importFixtures(const std::string& squad, const std::vector<Fixture>& fixtures,
                                 const std::string& source = "fixtures");
    /// Removes the squad's fixture on `date`; false when there is none.
    bool remove(const std::string& squad, const std::string& date);
    /// The squad's fixtures of one season (every season when empty), by date, each with the
    /// stored match of its date (linked or not yet).
    std::vector<Fixture> list(const std::string& squad, const std::string& season = "") const;
    /// Links every unlinked fixture to the squad's stored match of the same date; returns how
    /// many were linked. Ingest calls it after storing a match (and imports call it too).
    int linkMatches();

    /// The club's intensity caps (setting `microcycle.caps`; the defaults while unset).
    IntensityCaps caps() const;
    void saveCaps(const IntensityCaps& caps);
    /// The caps as the (key, value) of the setting saveCaps writes, to save them together with
    /// other settings (ClubRepository::saveFlagSettings).
    static std::pair<std::string, std::string> capsSetting(const IntensityCaps& caps);

  private:
    ClubRepository& m_repo;
};

/// One stored block of a session.
struct SavedBlock {
    BlockRole role = BlockRole::Main;
    std::int64_t drillId = 0;
    int minutes = 0;
    std::optional<std::int64_t> focusId;
    bool pinned = false;
    std::string why;
};

/// What became of a saved session.
enum class SessionOutcome { Planned, Held, Changed, Cancelled };
std::string_view toString(SessionOutcome o);
std::optional<SessionOutcome> sessionOutcomeFromString(std::string_view s);

struct SavedSession {
    std::int64_t id = 0;
    std::string squad;
    std::string season;
    std::string date;
    int minutes = 0; ///< the session's length as planned
    int players = 0;
    std::string dayLabel;
    int cap = 0;
    long objective = 0;
    std::string savedBy;
    std::string savedAt;
    std::vector<SavedBlock> blocks;
    std::vector<std::pair<std::int64_t, int>> focusMinutes; ///< (focus id, minutes), by id
    SessionOutcome outcome = SessionOutcome::Planned;
    std::optional<int> playersPresent; ///< once marked held or changed
    std::vector<std::optional<int>> heldMinutes; ///< per block, as done (held or changed)
    std::string recordedBy;
    std::string recordedAt;
};

/// How a session went, as the staff record it: held as planned, changed (the minutes each
/// block really took, 0 for a block left out), or cancelled; and how many players took part
/// (a count: no per-player load is kept).
struct SessionRecord {
    SessionOutcome outcome = SessionOutcome::Held;
    int playersPresent = 0;        ///< held or changed: 1 or more
    std::vector<int> blockMinutes; ///< changed: one per block, in the saved order
};

/// The training a focus got between two dates, from sessions as held.
struct FocusTraining {
    int heldMinutes = 0;        ///< minutes of sessions held or changed that worked on it
    int heldSessions = 0;       ///< sessions held or changed that gave it minutes
    int unrecordedSessions = 0; ///< saved sessions for it not yet marked held or cancelled
    int unrecordedMinutes = 0;  ///< the minutes those sessions planned for it
    int cancelledSessions = 0;
    int plannedMinutes = 0;     ///< what every saved session planned for it, held or not
};

/// The review's and the focus pages' sentence about it: "94 minutes in 5 sessions held from
/// 2026-09-27 to 2026-10-24; 1 saved session (20 min) not yet marked held or cancelled is not
/// counted".
std::string trainingNote(const FocusTraining& t, const std::string& from, const std::string& to);

struct SessionSave {
    std::int64_t id = 0;
    bool replaced = false; ///< a session of the same date was replaced
};

/// Planned sessions: one a squad and date (saving again replaces it).
class SessionStore {
  public:
    explicit SessionStore(ClubRepository& repo) : m_repo(repo) {}

    /// Saves a plan for `squad` in one transaction (blocks and minutes per stored focus).
    /// Throws StorageError when a block's drill or focus is not in the club file.
    SessionSave save(const std::string& squad, const Plan& plan, const std::string& by,
                     const std::string& now);
    std::optional<SavedSession> get(const std::string& squad, const std::string& date) const;
    /// The squad's sessions dated `from`–`to` (inclusive; empty: open-ended), by date.
    std::vector<SavedSession> list(const std::string& squad, const std::string& from = "",
                                   const std::string& to = "") const;
    bool remove(const std::string& squad, const std::string& date);
    /// Drills of the squad's session on `date` (empty when there was none): the planner's
    /// "yesterday" when asked for the day before.
    std::vector<std::int64_t> drillsOn(const std::string& squad, const std::string& date) const;

    /// Minutes of saved sessions of `squad` dated `from`–`to` (inclusive) spent in blocks whose
    /// drill is one of `drills`: the training time a focus review reports.
    int minutesOnDrills(const std::string& squad, const std::string& from, const std::string& to,
                        const std::vector<std::int64_t>& drills) const;
    /// Minutes saved sessions dated `from`–`to` gave to focus `focusId` (any drill working on it),
    /// as planned: every saved session, held or not.
    int minutesOnFocus(std::int64_t focusId, const std::string& from, const std::string& to) const;
    /// The training focus `focusId` got from sessions dated `from`–`to` as held: held and changed
    /// sessions count (changed ones with the minutes really done), cancelled ones do not, and
    /// sessions not yet marked are counted apart.
    FocusTraining trainingOnFocus(std::int64_t focusId, const std::string& from, const std::string& to) const;

    /// Records how the squad's session on `date` went. Refused (a problem, nothing changed)
    /// when there is no saved session that day, the day is after `today`, the players are not
    /// a count of 1 or more, or a changed session's minutes are not one whole number 0–300 per
    /// block. A changed session's focus minutes are counted again from the blocks as done
    /// (a block counts for a focus when its drill works on it: model/planner.h worksOn).
    Problems record(const std::string& squad, const std::string& date, const SessionRecord& how,
                    const std::string& today, const std::string& by, const std::string& now);

  private:
    ClubRepository& m_repo;
};

} // namespace pitchloop::model
