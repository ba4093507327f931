#include "sessions.h"
#include "storeguard.h"

#include "drills.h"
#include "focus.h"
#include "repository.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>
#include <map>
#include <set>

namespace pitchloop::model {

namespace {

const char* kCapsKey = "microcycle.caps";

std::optional<std::int64_t> seasonId(SQLite::Database& db, const std::string& squad,
                                     const std::string& season) {
    SQLite::Statement q(db, "SELECT se.id FROM season se JOIN squad sq ON sq.id = se.squad_id "
                            "WHERE sq.name = ? AND se.name = ?");
    q.bind(1, squad);
    q.bind(2, season);
    if (!q.executeStep()) return std::nullopt;
    return q.getColumn(0).getInt64();
}

int linkUnlinked(SQLite::Database& db) {
    return db.exec("UPDATE fixture SET match_id = (SELECT min(m.id) FROM match m WHERE "
                   "m.season_id = fixture.season_id AND m.date = fixture.date) "
                   "WHERE match_id IS NULL AND EXISTS (SELECT 1 FROM match m WHERE "
                   "m.season_id = fixture.season_id AND m.date = fixture.date)");
}

std::optional<BlockRole> roleFromString(const std::string& s) {
    for (BlockRole r : {BlockRole::WarmUp, BlockRole::Main, BlockRole::CoolDown})
        if (toString(r) == s) return r;
    return std::nullopt;
}

} // namespace

// Fixtures ---------------------------------------------------------------------------------

FixtureImport FixtureStore::importFixtures(const std::string& squad,
                                           const std::vector<Fixture>& fixtures,
                                           const std::string& source) {
    FixtureImport r;
    std::map<std::string, std::size_t> byDate;
    for (std::size_t i = 0; i < fixtures.size(); ++i) {
        const std::string place = "fixtures[" + std::to_string(i) + "]";
        const Problems p = validateFixture(fixtures[i], source, place);
        r.errors.insert(r.errors.end(), p.begin(), p.end());
        if (auto [it, fresh] = byDate.emplace(fixtures[i].date, i); !fresh && p.empty())
            r.errors.push_back({source, place, "date",
                                "a second fixture on " + fixtures[i].date +
                                    " (the first is "
                                    "fixtures[" +
                                    std::to_string(it->second) + "])"});
    }
    if (squad.empty()) r.errors.push_back({source, "", "squad", "missing"});
    if (!r.errors.empty()) return r;

    std::set<std::string> seasons;
    for (const Fixture& f : fixtures)
        seasons.insert(seasonOf(f.date));
    for (const auto& s : seasons)
        m_repo.ensureSeason(squad, s);
    SQLite::Database& db = m_repo.database();
    guarded("cannot save fixtures", [&] {
        SQLite::Transaction tx(db);
        SQLite::Statement find(db, "SELECT id, kickoff, opponent, venue, competition FROM fixture "
                                   "WHERE season_id = ? AND date = ?");
        SQLite::Statement update(db, "UPDATE fixture SET kickoff = ?, opponent = ?, venue = ?, "
                                     "competition = ? WHERE id = ?");
        SQLite::Statement insert(db, "INSERT INTO fixture(season_id, date, kickoff, opponent, "
                                     "venue, competition) VALUES (?, ?, ?, ?, ?, ?)");
        for (const Fixture& f : fixtures) {
            const std::int64_t season = *seasonId(db, squad, seasonOf(f.date));
            find.reset();
            find.bind(1, season);
            find.bind(2, f.date);
            if (find.executeStep()) {
                const std::int64_t id = find.getColumn(0).getInt64();
                if (find.getColumn(1).getString() == f.kickoff &&
                    find.getColumn(2).getString() == f.opponent &&
                    find.getColumn(3).getString() == f.venue &&
                    find.getColumn(4).getString() == f.competition) {
                    ++r.unchanged;
                    continue;
                }
                update.reset();
                update.bind(1, f.kickoff);
                update.bind(2, f.opponent);
                update.bind(3, f.venue);
                update.bind(4, f.competition);
                update.bind(5, id);
                update.exec();
                ++r.updated;
            } else {
                insert.reset();
                insert.bind(1, season);
                insert.bind(2, f.date);
                insert.bind(3, f.kickoff);
                insert.bind(4, f.opponent);
                insert.bind(5, f.venue);
                insert.bind(6, f.competition);
                insert.exec();
                ++r.added;
            }
        }
        r.linked = linkUnlinked(db);
        tx.commit();
        return 0;
    });
    return r;
}

bool FixtureStore::remove(const std::string& squad, const std::string& date) {
    if (!dayNumber(date)) return false;
    SQLite::Database& db = m_repo.database();
    return guarded("cannot remove fixture", [&] {
        SQLite::Statement q(db, "DELETE FROM fixture WHERE date = ? AND season_id IN (SELECT "
                                "se.id FROM season se JOIN squad sq ON sq.id = se.squad_id "
                                "WHERE sq.name = ?)");
        q.bind(1, date);
        q.bind(2, squad);
        return q.exec() > 0;
    });
}

std::vector<Fixture> FixtureStore::list(const std::string& squad, const std::string& season) const {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot read fixtures", [&] {
        std::vector<Fixture> out;
        // A match stored since the last linkMatches() shows too (same season and date).
        SQLite::Statement q(db, "SELECT f.date, f.kickoff, f.opponent, f.venue, f.competition, "
                                "m.code FROM fixture f JOIN season se ON se.id = f.season_id "
                                "JOIN squad sq ON sq.id = se.squad_id LEFT JOIN match m ON "
                                "m.id = coalesce(f.match_id, (SELECT min(x.id) FROM match x "
                                "WHERE x.season_id = f.season_id AND x.date = f.date)) "
                                "WHERE sq.name = ? AND (? = '' OR se.name = ?) ORDER BY f.date");
        q.bind(1, squad);
        q.bind(2, season);
        q.bind(3, season);
        while (q.executeStep()) {
            Fixture f;
            f.date = q.getColumn(0).getString();
            f.kickoff = q.getColumn(1).getString();
            f.opponent = q.getColumn(2).getString();
            f.venue = q.getColumn(3).getString();
            f.competition = q.getColumn(4).getString();
            if (!q.getColumn(5).isNull()) f.matchId = q.getColumn(5).getString();
            out.push_back(std::move(f));
        }
        return out;
    });
}

int FixtureStore::linkMatches() {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot link fixtures", [&] {
        SQLite::Transaction tx(db);
        const int n = linkUnlinked(db);
        tx.commit();
        return n;
    });
}

IntensityCaps FixtureStore::caps() const {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot read settings", [&] {
        SQLite::Statement q(db, "SELECT value FROM setting WHERE key = ?");
        q.bind(1, kCapsKey);
        if (!q.executeStep()) return IntensityCaps{};
        // A damaged value gives the defaults (parseCaps returns them with its problems).
        return parseCaps(q.getColumn(0).getString(), kCapsKey).caps;
    });
}

std::pair<std::string, std::string> FixtureStore::capsSetting(const IntensityCaps& caps) {
    return {kCapsKey, capsToJson(caps)};
}

void FixtureStore::saveCaps(const IntensityCaps& caps) {
    SQLite::Database& db = m_repo.database();
    guarded("cannot save settings", [&] {
        SQLite::Transaction tx(db);
        SQLite::Statement q(db, "INSERT INTO setting(key, value) VALUES (?, ?) "
                                "ON CONFLICT(key) DO UPDATE SET value = excluded.value");
        q.bind(1, kCapsKey);
        q.bind(2, capsToJson(caps));
        q.exec();
        tx.commit();
        return 0;
    });
}

// Sessions ---------------------------------------------------------------------------------

SessionSave SessionStore::save(const std::string& squad, const Plan& plan, const std::string& by,
                               const std::string& now) {
    if (!dayNumber(plan.date))
        throw StorageError("cannot save session: '" + plan.date + "' is not a date");
    const std::string season = seasonOf(plan.date);
    m_repo.ensureSeason(squad, season);
    SQLite::Database& db = m_repo.database();
    return guarded("cannot save session", [&] {
        SessionSave out;
        SQLite::Transaction tx(db);
        const std::int64_t seasonRow = *seasonId(db, squad, season);
        {
            SQLite::Statement del(db, "DELETE FROM session WHERE season_id = ? AND date = ?");
            del.bind(1, seasonRow);
            del.bind(2, plan.date);
            out.replaced = del.exec() > 0;
        }
        SQLite::Statement ins(db, "INSERT INTO session(season_id, date, minutes, players, "
                                  "day_label, intensity_cap, objective, saved_by, saved_at) "
                                  "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)");
        ins.bind(1, seasonRow);
        ins.bind(2, plan.date);
        ins.bind(3, plan.sessionMinutes);
        ins.bind(4, plan.playersAvailable);
        ins.bind(5, plan.day.label);
        ins.bind(6, plan.cap);
        ins.bind(7, static_cast<std::int64_t>(plan.objective));
        ins.bind(8, by);
        ins.bind(9, now);
        ins.exec();
        out.id = db.getLastInsertRowid();
        SQLite::Statement block(db, "INSERT INTO session_block(session_id, position, role, "
                                    "drill_id, minutes, focus_id, pinned, why) "
                                    "VALUES (?, ?, ?, ?, ?, ?, ?, ?)");
        int position = 0;
        for (const PlanBlock& b : plan.blocks) {
            block.reset();
            block.clearBindings();
            block.bind(1, out.id);
            block.bind(2, position++);
            block.bind(3, std::string(toString(b.role)));
            block.bind(4, b.drillId);
            block.bind(5, b.minutes);
            if (b.focus && *b.focus < plan.focusMinutes.size() &&
                plan.focusMinutes[*b.focus].focusId != 0)
                block.bind(6, plan.focusMinutes[*b.focus].focusId);
            else
                block.bind(6);
            block.bind(7, b.pinned ? 1 : 0);
            block.bind(8, b.why);
            block.exec();
        }
        SQLite::Statement focus(db, "INSERT INTO session_focus(session_id, focus_id, minutes) "
                                    "VALUES (?, ?, ?)");
        for (const FocusMinutes& fm : plan.focusMinutes) {
            if (fm.focusId == 0 || fm.minutes == 0) continue;
            focus.reset();
            focus.bind(1, out.id);
            focus.bind(2, fm.focusId);
            focus.bind(3, fm.minutes);
            focus.exec();
        }
        tx.commit();
        return out;
    });
}

std::vector<SavedSession> SessionStore::list(const std::string& squad, const std::string& from,
                                             const std::string& to) const {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot read sessions", [&] {
        std::vector<SavedSession> out;
        SQLite::Statement q(db, "SELECT s.id, sq.name, se.name, s.date, s.minutes, s.players, "
                                "s.day_label, s.intensity_cap, s.objective, s.saved_by, "
                                "s.saved_at, s.outcome, s.players_present, s.recorded_by, "
                                "s.recorded_at FROM session s JOIN season se ON se.id = s.season_id "
                                "JOIN squad sq ON sq.id = se.squad_id WHERE sq.name = ? AND "
                                "(? = '' OR s.date >= ?) AND (? = '' OR s.date <= ?) "
                                "ORDER BY s.date");
        q.bind(1, squad);
        q.bind(2, from);
        q.bind(3, from);
        q.bind(4, to);
        q.bind(5, to);
        while (q.executeStep()) {
            SavedSession s;
            s.id = q.getColumn(0).getInt64();
            s.squad = q.getColumn(1).getString();
            s.season = q.getColumn(2).getString();
            s.date = q.getColumn(3).getString();
            s.minutes = q.getColumn(4).getInt();
            s.players = q.getColumn(5).getInt();
            s.dayLabel = q.getColumn(6).getString();
            s.cap = q.getColumn(7).getInt();
            s.objective = static_cast<long>(q.getColumn(8).getInt64());
            s.savedBy = q.getColumn(9).getString();
            s.savedAt = q.getColumn(10).getString();
            const std::string outcome = q.getColumn(11).getString();
            const auto o = sessionOutcomeFromString(outcome);
            if (!o) throw StorageError("stored session has unknown outcome '" + outcome + "'");
            s.outcome = *o;
            if (!q.getColumn(12).isNull()) s.playersPresent = q.getColumn(12).getInt();
            s.recordedBy = q.getColumn(13).getString();
            s.recordedAt = q.getColumn(14).getString();
            out.push_back(std::move(s));
        }
        SQLite::Statement b(db, "SELECT role, drill_id, minutes, focus_id, pinned, why, held_minutes "
                                "FROM session_block WHERE session_id = ? ORDER BY position");
        SQLite::Statement f(db, "SELECT focus_id, minutes FROM session_focus WHERE session_id = ? "
                                "ORDER BY focus_id");
        for (SavedSession& s : out) {
            b.reset();
            b.bind(1, s.id);
            while (b.executeStep()) {
                SavedBlock block;
                const std::string role = b.getColumn(0).getString();
                const auto r = roleFromString(role);
                if (!r) throw StorageError("stored session block has unknown role '" + role + "'");
                block.role = *r;
                block.drillId = b.getColumn(1).getInt64();
                block.minutes = b.getColumn(2).getInt();
                if (!b.getColumn(3).isNull()) block.focusId = b.getColumn(3).getInt64();
                block.pinned = b.getColumn(4).getInt() != 0;
                block.why = b.getColumn(5).getString();
                s.heldMinutes.push_back(b.getColumn(6).isNull() ? std::nullopt
                                                                : std::optional(b.getColumn(6).getInt()));
                s.blocks.push_back(std::move(block));
            }
            f.reset();
            f.bind(1, s.id);
            while (f.executeStep())
                s.focusMinutes.emplace_back(f.getColumn(0).getInt64(), f.getColumn(1).getInt());
        }
        return out;
    });
}

std::optional<SavedSession> SessionStore::get(const std::string& squad,
                                              const std::string& date) const {
    auto sessions = list(squad, date, date);
    if (sessions.empty()) return std::nullopt;
    return std::move(sessions.front());
}

bool SessionStore::remove(const std::string& squad, const std::string& date) {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot remove session", [&] {
        SQLite::Statement q(db, "DELETE FROM session WHERE date = ? AND season_id IN (SELECT "
                                "se.id FROM season se JOIN squad sq ON sq.id = se.squad_id "
                                "WHERE sq.name = ?)");
        q.bind(1, date);
        q.bind(2, squad);
        return q.exec() > 0;
    });
}

std::vector<std::int64_t> SessionStore::drillsOn(const std::string& squad,
                                                 const std::string& date) const {
    std::vector<std::int64_t> out;
    if (auto s = get(squad, date))
        for (const SavedBlock& b : s->blocks)
            out.push_back(b.drillId);
    return out;
}

int SessionStore::minutesOnDrills(const std::string& squad, const std::string& from,
                                  const std::string& to,
                                  const std::vector<std::int64_t>& drills) const {
    if (drills.empty()) return 0;
    std::string in;
    for (std::size_t i = 0; i < drills.size(); ++i)
        in += i ? ", ?" : "?";
    SQLite::Database& db = m_repo.database();
    return guarded("cannot read sessions", [&] {
        SQLite::Statement q(db, "SELECT coalesce(sum(b.minutes), 0) FROM session_block b JOIN "
                                "session s ON s.id = b.session_id JOIN season se ON se.id = "
                                "s.season_id JOIN squad sq ON sq.id = se.squad_id WHERE "
                                "sq.name = ? AND s.date >= ? AND s.date <= ? AND b.drill_id IN (" +
                                    in + ")");
        q.bind(1, squad);
        q.bind(2, from);
        q.bind(3, to);
        for (std::size_t i = 0; i < drills.size(); ++i)
            q.bind(static_cast<int>(i) + 4, drills[i]);
        q.executeStep();
        return q.getColumn(0).getInt();
    });
}

int SessionStore::minutesOnFocus(std::int64_t focusId, const std::string& from,
                                 const std::string& to) const {
    return trainingOnFocus(focusId, from, to).plannedMinutes;
}

std::string_view toString(SessionOutcome o) {
    switch (o) {
    case SessionOutcome::Planned: return "planned";
    case SessionOutcome::Held: return "held";
    case SessionOutcome::Changed: return "changed";
    case SessionOutcome::Cancelled: return "cancelled";
    }
    return "planned";
}

std::optional<SessionOutcome> sessionOutcomeFromString(std::string_view s) {
    for (SessionOutcome o : {SessionOutcome::Planned, SessionOutcome::Held, SessionOutcome::Changed,
                             SessionOutcome::Cancelled})
        if (toString(o) == s) return o;
    return std::nullopt;
}

FocusTraining SessionStore::trainingOnFocus(std::int64_t focusId, const std::string& from,
                                            const std::string& to) const {
    SQLite::Database& db = m_repo.database();
    return guarded("cannot read sessions", [&] {
        FocusTraining t;
        SQLite::Statement q(db, "SELECT s.outcome, f.minutes, f.held_minutes FROM session_focus f JOIN "
                                "session s ON s.id = f.session_id WHERE f.focus_id = ? AND "
                                "s.date >= ? AND s.date <= ?");
        q.bind(1, focusId);
        q.bind(2, from);
        q.bind(3, to);
        while (q.executeStep()) {
            const std::string outcome = q.getColumn(0).getString();
            const int planned = q.getColumn(1).getInt();
            t.plannedMinutes += planned;
            if (outcome == "held" || outcome == "changed") {
                const int held = q.getColumn(2).isNull() ? planned : q.getColumn(2).getInt();
                t.heldMinutes += held;
                t.heldSessions += held > 0;
            } else if (outcome == "cancelled") {
                ++t.cancelledSessions;
            } else {
                ++t.unrecordedSessions;
                t.unrecordedMinutes += planned;
            }
        }
        return t;
    });
}

std::string trainingNote(const FocusTraining& t, const std::string& from, const std::string& to) {
    const auto plural = [](int n, const char* one, const char* many) {
        return std::to_string(n) + " " + (n == 1 ? one : many);
    };
    std::string s = plural(t.heldMinutes, "minute", "minutes") + " in " +
                    plural(t.heldSessions, "session", "sessions") + " held from " + from + " to " + to;
    if (t.cancelledSessions > 0) s += "; " + plural(t.cancelledSessions, "session was", "sessions were") + " cancelled";
    if (t.unrecordedSessions > 0)
        s += "; " + plural(t.unrecordedSessions, "saved session", "saved sessions") + " (" +
             std::to_string(t.unrecordedMinutes) + " min) not yet marked held or cancelled " +
             (t.unrecordedSessions == 1 ? "is" : "are") + " not counted";
    return s;
}

Problems SessionStore::record(const std::string& squad, const std::string& date, const SessionRecord& how,
                              const std::string& today, const std::string& by, const std::string& now) {
    Problems problems;
    const std::string source = "the session of " + date;
    auto problem = [&](const std::string& field, const std::string& message) {
        problems.push_back({source, "", field, message});
    };
    const auto saved = get(squad, date);
    if (!saved) {
        problem("date", "no saved session of " + squad + " on " + date);
        return problems;
    }
    if (date > today) problem("date", "is after today (" + today + "): a session is marked once its day has come");
    if (how.outcome == SessionOutcome::Planned) problem("outcome", "choose held, changed or cancelled");
    const bool took = how.outcome == SessionOutcome::Held || how.outcome == SessionOutcome::Changed;
    if (took && (how.playersPresent < 1 || how.playersPresent > 200))
        problem("players", "expected how many players took part, 1 or more (got " + std::to_string(how.playersPresent) + ")");
    if (how.outcome == SessionOutcome::Changed) {
        if (how.blockMinutes.size() != saved->blocks.size())
            problem("minutes", "expected the minutes of each of the " + std::to_string(saved->blocks.size()) +
                                   " blocks (got " + std::to_string(how.blockMinutes.size()) + ")");
        for (std::size_t i = 0; i < how.blockMinutes.size(); ++i)
            if (how.blockMinutes[i] < 0 || how.blockMinutes[i] > 300)
                problem("minutes", "block " + std::to_string(i + 1) + ": " + std::to_string(how.blockMinutes[i]) +
                                       " is not a number of minutes from 0 to 300");
    }
    if (!problems.empty()) return problems;

    // Minutes as done per block, and per focus: a block counts for a focus when its drill works
    // on it, as when the plan was made (the live drill and focus).
    std::vector<int> done;
    for (std::size_t i = 0; i < saved->blocks.size(); ++i)
        done.push_back(how.outcome == SessionOutcome::Cancelled ? 0
                       : how.outcome == SessionOutcome::Changed ? how.blockMinutes[i]
                                                                : saved->blocks[i].minutes);
    std::map<std::int64_t, int> focusDone;
    const ZoneGrid grid = m_repo.tallyGrid();
    for (const auto& [focusId, planned] : saved->focusMinutes) {
        if (how.outcome == SessionOutcome::Held) {
            focusDone[focusId] = planned;
            continue;
        }
        int minutes = 0;
        if (how.outcome == SessionOutcome::Changed) {
            const auto focus = FocusStore(m_repo).get(focusId);
            PlanFocus f;
            if (focus) {
                f.metric = focus->metric;
                f.zones = focus->grid == grid ? focus->zones : mapZones(focus->zones, focus->grid, grid);
                f.linkedDrills = focus->drills;
            }
            for (std::size_t i = 0; i < saved->blocks.size(); ++i) {
                const auto drill = DrillBook(m_repo).get(saved->blocks[i].drillId);
                if (focus && drill && worksOn(*drill, f)) minutes += done[i];
            }
        }
        focusDone[focusId] = minutes;
    }
    SQLite::Database& db = m_repo.database();
    guarded("cannot record the session", [&] {
        SQLite::Transaction tx(db);
        SQLite::Statement s(db, "UPDATE session SET outcome = ?, players_present = ?, recorded_by = ?, "
                                "recorded_at = ? WHERE id = ?");
        s.bind(1, std::string(toString(how.outcome)));
        if (how.outcome == SessionOutcome::Cancelled) s.bind(2);
        else s.bind(2, how.playersPresent);
        s.bind(3, by);
        s.bind(4, now);
        s.bind(5, saved->id);
        s.exec();
        SQLite::Statement b(db, "UPDATE session_block SET held_minutes = ? WHERE session_id = ? AND position = ?");
        for (std::size_t i = 0; i < done.size(); ++i) {
            b.reset();
            b.bind(1, done[i]);
            b.bind(2, saved->id);
            b.bind(3, static_cast<int>(i));
            b.exec();
        }
        SQLite::Statement f(db, "UPDATE session_focus SET held_minutes = ? WHERE session_id = ? AND focus_id = ?");
        for (const auto& [focusId, minutes] : focusDone) {
            f.reset();
            f.bind(1, minutes);
            f.bind(2, saved->id);
            f.bind(3, focusId);
            f.exec();
        }
        tx.commit();
        return 0;
    });
    return problems;
}

} // namespace pitchloop::model
