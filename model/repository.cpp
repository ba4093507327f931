#include "repository.h"
#include "storeguard.h"

#include "clock.h"
#include "gridchange.h"
#include "problem.h"

#include <SQLiteCpp/Backup.h>
#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>
#include <nlohmann/json.hpp>

#include <chrono>
#include <cstdint>
#include <cstdio>
#include <map>

namespace pitchloop::model {

namespace {

// Each entry moves the schema one version up. Never edit a released entry: add a new one.
const char* const kMigrations[] = {
    // 1: the first shape of the club file.
    R"sql(
CREATE TABLE club(
  id INTEGER PRIMARY KEY,
  name TEXT NOT NULL UNIQUE);
CREATE TABLE squad(
  id INTEGER PRIMARY KEY,
  club_id INTEGER NOT NULL REFERENCES club(id) ON DELETE CASCADE,
  name TEXT NOT NULL,
  UNIQUE(club_id, name));
CREATE TABLE season(
  id INTEGER PRIMARY KEY,
  squad_id INTEGER NOT NULL REFERENCES squad(id) ON DELETE CASCADE,
  name TEXT NOT NULL,
  starts TEXT NOT NULL,
  ends TEXT NOT NULL,
  UNIQUE(squad_id, name));
CREATE TABLE match(
  id INTEGER PRIMARY KEY,
  code TEXT NOT NULL UNIQUE,
  season_id INTEGER NOT NULL REFERENCES season(id),
  date TEXT NOT NULL,
  competition TEXT NOT NULL DEFAULT '',
  venue TEXT NOT NULL,
  us TEXT NOT NULL,
  opponent TEXT NOT NULL,
  goals_us INTEGER,
  goals_opp INTEGER,
  length_m REAL NOT NULL,
  width_m REAL NOT NULL,
  source_frame TEXT NOT NULL,
  extra TEXT);
CREATE INDEX match_by_season ON match(season_id, date);
CREATE TABLE period(
  match_id INTEGER NOT NULL REFERENCES match(id) ON DELETE CASCADE,
  n INTEGER NOT NULL,
  length_s REAL NOT NULL,
  PRIMARY KEY(match_id, n)) WITHOUT ROWID;
CREATE TABLE event(
  match_id INTEGER NOT NULL REFERENCES match(id) ON DELETE CASCADE,
  seq INTEGER NOT NULL,
  file_index INTEGER NOT NULL,
  period INTEGER NOT NULL,
  t REAL NOT NULL,
  side TEXT NOT NULL CHECK(side IN ('us', 'opp')),
  player TEXT NOT NULL DEFAULT '',
  type TEXT NOT NULL,
  result TEXT NOT NULL DEFAULT '',
  x REAL NOT NULL,
  y REAL NOT NULL,
  to_x REAL,
  to_y REAL,
  tags TEXT,
  extra TEXT,
  PRIMARY KEY(match_id, seq)) WITHOUT ROWID;
CREATE TABLE metric(
  id TEXT PRIMARY KEY,
  spec TEXT NOT NULL,
  builtin INTEGER NOT NULL DEFAULT 0,
  position INTEGER NOT NULL);
CREATE TABLE tally(
  match_id INTEGER NOT NULL REFERENCES match(id) ON DELETE CASCADE,
  metric_id TEXT NOT NULL REFERENCES metric(id) ON DELETE CASCADE,
  band INTEGER NOT NULL,
  lane INTEGER NOT NULL,
  num INTEGER NOT NULL,
  den INTEGER NOT NULL,
  PRIMARY KEY(match_id, metric_id, band, lane)) WITHOUT ROWID;
)sql",
    // 2: remember each match's source file (to recognise re-ingests) and club settings.
    R"sql(
ALTER TABLE match ADD COLUMN source_name TEXT NOT NULL DEFAULT '';
ALTER TABLE match ADD COLUMN source_hash TEXT NOT NULL DEFAULT '';
ALTER TABLE match ADD COLUMN ingested_at TEXT NOT NULL DEFAULT '';
CREATE TABLE setting(
  key TEXT PRIMARY KEY,
  value TEXT NOT NULL) WITHOUT ROWID;
INSERT INTO setting(key, value) VALUES ('tally_grid', 'equal:6x5');
)sql",
    // 3: season targets as an effective-dated history (never overwritten).
    R"sql(
CREATE TABLE target(
  id INTEGER PRIMARY KEY,
  season_id INTEGER NOT NULL REFERENCES season(id) ON DELETE CASCADE,
  metric_id TEXT NOT NULL,
  band INTEGER NOT NULL,
  lane INTEGER NOT NULL,
  direction TEXT NOT NULL CHECK(direction IN ('at_least', 'at_most')),
  value REAL NOT NULL,
  watch_margin REAL NOT NULL,
  min_sample INTEGER NOT NULL,
  author TEXT NOT NULL,
  rationale TEXT NOT NULL DEFAULT '',
  effective_from TEXT NOT NULL,
  recorded_at TEXT NOT NULL,
  retired INTEGER NOT NULL DEFAULT 0);
CREATE INDEX target_by_key ON target(season_id, metric_id, band, lane, effective_from);
)sql",
    // 4: the coaches' drill book (versioned, reversible deletes), focuses and their reviews.
    R"sql(
CREATE TABLE drill(
  id INTEGER PRIMARY KEY,
  created_at TEXT NOT NULL,
  deleted_at TEXT);
CREATE TABLE drill_version(
  id INTEGER PRIMARY KEY,
  drill_id INTEGER NOT NULL REFERENCES drill(id) ON DELETE CASCADE,
  body TEXT NOT NULL,
  title TEXT NOT NULL,
  search_text TEXT NOT NULL,
  edited_by TEXT NOT NULL,
  edited_at TEXT NOT NULL);
CREATE INDEX drill_version_by_drill ON drill_version(drill_id, id);
CREATE TABLE focus(
  id INTEGER PRIMARY KEY,
  season_id INTEGER NOT NULL REFERENCES season(id),
  metric_id TEXT NOT NULL,
  zones TEXT NOT NULL,
  opened_after_match TEXT NOT NULL,
  start_date TEXT NOT NULL,
  review_after_matches INTEGER,
  review_on TEXT,
  evidence TEXT NOT NULL,
  note TEXT NOT NULL DEFAULT '',
  opened_by TEXT NOT NULL,
  opened_at TEXT NOT NULL,
  closed_at TEXT,
  verdict TEXT,
  verdict_note TEXT);
CREATE TABLE focus_drill(
  focus_id INTEGER NOT NULL REFERENCES focus(id) ON DELETE CASCADE,
  drill_id INTEGER NOT NULL REFERENCES drill(id),
  linked_at TEXT NOT NULL,
  PRIMARY KEY(focus_id, drill_id)) WITHOUT ROWID;
CREATE TABLE review(
  id INTEGER PRIMARY KEY,
  focus_id INTEGER NOT NULL REFERENCES focus(id) ON DELETE CASCADE,
  computed_at TEXT NOT NULL,
  numbers TEXT NOT NULL,
  verdict TEXT,
  note TEXT NOT NULL DEFAULT '',
  recorded_by TEXT NOT NULL DEFAULT '');
)sql",
    // 5: fixtures (a squad's season schedule) and planned training sessions with their blocks
    // and the minutes each gave to each focus.
    R"sql(
CREATE TABLE fixture(
  id INTEGER PRIMARY KEY,
  season_id INTEGER NOT NULL REFERENCES season(id) ON DELETE CASCADE,
  date TEXT NOT NULL,
  kickoff TEXT NOT NULL DEFAULT '',
  opponent TEXT NOT NULL,
  venue TEXT NOT NULL CHECK(venue IN ('home', 'away', 'neutral')),
  competition TEXT NOT NULL DEFAULT '',
  match_id INTEGER REFERENCES match(id) ON DELETE SET NULL,
  UNIQUE(season_id, date));
CREATE TABLE session(
  id INTEGER PRIMARY KEY,
  season_id INTEGER NOT NULL REFERENCES season(id) ON DELETE CASCADE,
  date TEXT NOT NULL,
  minutes INTEGER NOT NULL,
  players INTEGER NOT NULL,
  day_label TEXT NOT NULL,
  intensity_cap INTEGER NOT NULL,
  objective INTEGER NOT NULL,
  saved_by TEXT NOT NULL,
  saved_at TEXT NOT NULL,
  UNIQUE(season_id, date));
CREATE TABLE session_block(
  session_id INTEGER NOT NULL REFERENCES session(id) ON DELETE CASCADE,
  position INTEGER NOT NULL,
  role TEXT NOT NULL CHECK(role IN ('warm_up', 'main', 'cool_down')),
  drill_id INTEGER NOT NULL REFERENCES drill(id),
  minutes INTEGER NOT NULL,
  focus_id INTEGER REFERENCES focus(id) ON DELETE SET NULL,
  pinned INTEGER NOT NULL DEFAULT 0,
  why TEXT NOT NULL,
  PRIMARY KEY(session_id, position)) WITHOUT ROWID;
CREATE INDEX session_block_by_drill ON session_block(drill_id);
CREATE TABLE session_focus(
  session_id INTEGER NOT NULL REFERENCES session(id) ON DELETE CASCADE,
  focus_id INTEGER NOT NULL REFERENCES focus(id) ON DELETE CASCADE,
  minutes INTEGER NOT NULL,
  PRIMARY KEY(session_id, focus_id)) WITHOUT ROWID;
)sql",
    // 6: the grid each zone-bearing record was written on, so the club's grid can change
    // (docs/storage.md, "Changing the zone grid"). Whole-pitch targets ('') belong to no grid.
    R"sql(
ALTER TABLE target ADD COLUMN grid TEXT NOT NULL DEFAULT '';
UPDATE target SET grid = COALESCE((SELECT value FROM setting WHERE key = 'tally_grid'),
                                  'equal:6x5') WHERE band <> 0 OR lane <> 0;
ALTER TABLE focus ADD COLUMN grid TEXT NOT NULL DEFAULT '';
UPDATE focus SET grid = COALESCE((SELECT value FROM setting WHERE key = 'tally_grid'),
                                 'equal:6x5');
ALTER TABLE drill_version ADD COLUMN grid TEXT NOT NULL DEFAULT '';
UPDATE drill_version SET grid = COALESCE((SELECT value FROM setting WHERE key = 'tally_grid'),
                                         'equal:6x5');
CREATE TABLE grid_change(
  id INTEGER PRIMARY KEY,
  from_grid TEXT NOT NULL,
  to_grid TEXT NOT NULL,
  changed_by TEXT NOT NULL,
  changed_at TEXT NOT NULL,
  summary TEXT NOT NULL DEFAULT '');
)sql",
    // 7: the smallest change a coach states, at opening, would matter (docs/reviews.md); NULL
    // for focuses opened before: their review uses the target's watch margin.
    R"sql(
ALTER TABLE focus ADD COLUMN min_change REAL;
)sql",
    // 8: mapping profiles saved in the club file, so a table in a known layout loads on drop
    // (docs/import.md).
    R"sql(
CREATE TABLE import_profile(
  name TEXT PRIMARY KEY,
  profile TEXT NOT NULL,
  saved_by TEXT NOT NULL DEFAULT '',
  saved_at TEXT NOT NULL DEFAULT '');
)sql",
    // 9: zone-only matches (docs/import.md, "Zone-only data"): the grid whose zone centres
    // their positions are; '' for measured positions, as every match stored before was.
    R"sql(
ALTER TABLE match ADD COLUMN zone_grid TEXT NOT NULL DEFAULT '';
)sql",
    // 10: training as held (docs/planner.md, "Training as held"): a saved session is planned
    // until the staff mark it held, changed (minutes per block as done) or cancelled, with how
    // many players took part; focus minutes then count what was held.
    R"sql(
ALTER TABLE session ADD COLUMN outcome TEXT NOT NULL DEFAULT 'planned'
  CHECK(outcome IN ('planned', 'held', 'changed', 'cancelled'));
ALTER TABLE session ADD COLUMN players_present INTEGER;
ALTER TABLE session ADD COLUMN recorded_by TEXT NOT NULL DEFAULT '';
ALTER TABLE session ADD COLUMN recorded_at TEXT NOT NULL DEFAULT '';
ALTER TABLE session_block ADD COLUMN held_minutes INTEGER;
ALTER TABLE session_focus ADD COLUMN held_minutes INTEGER;
)sql",
    // 11: a squad's list of players (docs/moments.md, "Who was involved"): the ids match files
    // give (shirt numbers) with a name and a position, so moments name their players.
    R"sql(
CREATE TABLE squad_player(
  squad_id INTEGER NOT NULL REFERENCES squad(id) ON DELETE CASCADE,
  number TEXT NOT NULL,
  name TEXT NOT NULL,
  position TEXT NOT NULL,
  PRIMARY KEY(squad_id, number)) WITHOUT ROWID;
)sql",
};

static_assert(std::size(kMigrations) == ClubRepository::kSchemaVersion);

void bindOptionalInt(SQLite::Statement& st, int index, const std::optional<int>& v) {
    if (v) st.bind(index, *v);
    else st.bind(index);
}

std::optional<int> optionalInt(const SQLite::Column& c) {
    if (c.isNull()) return std::nullopt;
    return c.getInt();
}

const char* kSummaryColumns =
    "m.code, m.date, m.competition, m.venue, m.opponent, m.goals_us, m.goals_opp, sq.name, "
    "se.name, m.length_m, m.width_m, (SELECT count(*) FROM event e WHERE e.match_id = m.id), "
    "m.source_name, m.source_hash, m.ingested_at, m.zone_grid "
    "FROM match m JOIN season se ON se.id = m.season_id JOIN squad sq ON sq.id = se.squad_id ";

MatchSummary readSummary(SQLite::Statement& q) {
    MatchSummary s;
    s.id = q.getColumn(0).getString();
    s.date = q.getColumn(1).getString();
    s.competition = q.getColumn(2).getString();
    s.venue = q.getColumn(3).getString();
    s.opponent = q.getColumn(4).getString();
    s.goalsUs = optionalInt(q.getColumn(5));
    s.goalsOpp = optionalInt(q.getColumn(6));
    s.squad = q.getColumn(7).getString();
    s.season = q.getColumn(8).getString();
    s.pitch = {q.getColumn(9).getDouble(), q.getColumn(10).getDouble()};
    s.eventCount = q.getColumn(11).getInt();
    s.source = {q.getColumn(12).getString(), q.getColumn(13).getString(),
                q.getColumn(14).getString()};
    s.zoneOnlyGrid = q.getColumn(15).getString();
    return s;
}

} // namespace

namespace {

MatchInfo zoneInfoOf(const MatchSummary& m) {
    MatchInfo info;
    info.pitch = m.pitch;
    info.zoneOnlyGrid = m.zoneOnlyGrid;
    return info;
}

} // namespace

bool MatchSummary::zonesKnownOn(const ZoneGrid& grid) const {
    return model::zonesKnownOn(zoneInfoOf(*this), grid);
}

std::string MatchSummary::zoneOnlyNote(const ZoneGrid& grid) const {
    return model::zoneOnlyNote(zoneInfoOf(*this), grid);
}

std::string contentHash(std::string_view bytes) {
    std::uint64_t h = 14695981039346656037ull;
    for (unsigned char c : bytes) {
        h ^= c;
        h *= 1099511628211ull;
    }
    char buf[17];
    std::snprintf(buf, sizeof buf, "%016llx", static_cast<unsigned long long>(h));
    return buf;
}

std::string seasonOf(const std::string& isoDate) {
    const int year = std::stoi(isoDate.substr(0, 4));
    const int month = std::stoi(isoDate.substr(5, 2));
    const int first = month >= 7 ? year : year - 1;
    char buf[16];
    std::snprintf(buf, sizeof buf, "%d-%02d", first, (first + 1) % 100);
    return buf;
}

void ClubRepository::migrate(SQLite::Database& db, int version) {
    const int current = db.execAndGet("PRAGMA user_version").getInt();
    if (current > kSchemaVersion)
        throw StorageError("the club file has schema version " + std::to_string(current) +
                           ", newer than this Pitchloop understands (" +
                           std::to_string(kSchemaVersion) + "); use a newer Pitchloop");
    for (int v = current + 1; v <= version; ++v) {
        SQLite::Transaction tx(db);
        db.exec(kMigrations[v - 1]);
        db.exec("PRAGMA user_version = " + std::to_string(v));
        tx.commit();
    }
}

ClubRepository::ClubRepository(const std::string& file) {
    guarded("cannot open club file", [&] {
        m_db = std::make_unique<SQLite::Database>(file, SQLite::OPEN_READWRITE |
                                                            SQLite::OPEN_CREATE);
        m_db->exec("PRAGMA foreign_keys = ON");
        if (m_db->execAndGet("PRAGMA user_version").getInt() > kSchemaVersion)
            migrate(*m_db, kSchemaVersion); // refuses before anything is changed
        if (file != ":memory:") {
            m_db->exec("PRAGMA journal_mode = WAL");
            m_db->exec("PRAGMA synchronous = NORMAL");
        }
        m_db->setBusyTimeout(5000);
        migrate(*m_db, kSchemaVersion);
        // Built-in metrics are always present; a newer Pitchloop may have changed them.
        for (const auto& spec : builtinMetrics()) {
            SQLite::Statement q(*m_db, "SELECT spec FROM metric WHERE id = ?");
            q.bind(1, spec.id);
            if (!q.executeStep() || q.getColumn(0).getString() != spec.json) saveMetric(spec);
        }
        return 0;
    });
}

ClubRepository::~ClubRepository() = default;

int ClubRepository::schemaVersion() const {
    return guarded("cannot read schema version",
                   [&] { return m_db->execAndGet("PRAGMA user_version").getInt(); });
}

std::string ClubRepository::clubName() const {
    return guarded("cannot read club", [&] {
        SQLite::Statement q(*m_db, "SELECT name FROM club ORDER BY id LIMIT 1");
        return q.executeStep() ? q.getColumn(0).getString() : std::string{};
    });
}

ZoneGrid ClubRepository::tallyGrid() const {
    return guarded("cannot read settings", [&] {
        SQLite::Statement q(*m_db, "SELECT value FROM setting WHERE key = 'tally_grid'");
        if (q.executeStep())
            if (auto g = ZoneGrid::parse(q.getColumn(0).getString())) return *g;
        return ZoneGrid{};
    });
}

std::vector<MetricSpec> ClubRepository::metrics() const {
    return guarded("cannot read metrics", [&] {
        std::vector<MetricSpec> out;
        SQLite::Statement q(*m_db, "SELECT id, spec FROM metric ORDER BY position, id");
        while (q.executeStep()) {
            auto parsed = parseMetricSpec(q.getColumn(1).getString(), "club file");
            if (!parsed.spec)
                throw StorageError("stored metric '" + q.getColumn(0).getString() +
                                   "' no longer parses:\n" + describeAll(parsed.errors));
            out.push_back(std::move(*parsed.spec));
        }
        return out;
    });
}

std::optional<MetricSpec> ClubRepository::metric(const std::string& id) const {
    for (auto& m : metrics())
        if (m.id == id) return m;
    return std::nullopt;
}

void ClubRepository::saveMetric(const MetricSpec& spec) {
    guarded("cannot save metric", [&] {
        bool builtin = false;
        for (const auto& b : builtinMetrics()) {
            if (b.id != spec.id) continue;
            if (b.json != spec.json)
                throw StorageError("'" + spec.id +
                                   "' is a built-in metric; give your variant its own id");
            builtin = true;
        }
        SQLite::Transaction tx(*m_db);
        SQLite::Statement q(*m_db,
                            "INSERT INTO metric(id, spec, builtin, position) VALUES (?, ?, ?, "
                            "(SELECT coalesce(max(position), 0) + 1 FROM metric)) "
                            "ON CONFLICT(id) DO UPDATE SET spec = excluded.spec, "
                            "builtin = excluded.builtin");
        q.bind(1, spec.id);
        q.bind(2, spec.json);
        q.bind(3, builtin ? 1 : 0);
        q.exec();
        SQLite::Statement ids(*m_db, "SELECT id FROM match");
        std::vector<std::int64_t> rows;
        while (ids.executeStep()) rows.push_back(ids.getColumn(0).getInt64());
        SQLite::Statement code(*m_db, "SELECT code FROM match WHERE id = ?");
        for (std::int64_t row : rows) {
            code.reset();
            code.bind(1, row);
            code.executeStep();
            auto match = loadMatch(code.getColumn(0).getString());
            writeTallies(row, *match, {spec});
        }
        tx.commit();
        return 0;
    });
}

bool ClubRepository::removeMetric(const std::string& id) {
    for (const auto& b : builtinMetrics())
        if (b.id == id) throw StorageError("'" + id + "' is a built-in metric and stays");
    return guarded("cannot remove metric", [&] {
        SQLite::Statement q(*m_db, "DELETE FROM metric WHERE id = ?");
        q.bind(1, id);
        return q.exec() > 0;
    });
}

std::optional<SourceFile> ClubRepository::sourceOf(const std::string& matchId) const {
    return guarded("cannot read match", [&]() -> std::optional<SourceFile> {
        SQLite::Statement q(*m_db,
                            "SELECT source_name, source_hash, ingested_at FROM match WHERE code = ?");
        q.bind(1, matchId);
        if (!q.executeStep()) return std::nullopt;
        return SourceFile{q.getColumn(0).getString(), q.getColumn(1).getString(),
                          q.getColumn(2).getString()};
    });
}

std::vector<MatchSummary> ClubRepository::matches() const {
    return guarded("cannot list matches", [&] {
        std::vector<MatchSummary> out;
        SQLite::Statement q(*m_db, std::string("SELECT ") + kSummaryColumns +
                                       "ORDER BY m.date, m.code");
        while (q.executeStep()) out.push_back(readSummary(q));
        return out;
    });
}

std::optional<MatchSummary> ClubRepository::matchSummary(const std::string& matchId) const {
    return guarded("cannot read match", [&]() -> std::optional<MatchSummary> {
        SQLite::Statement q(*m_db, std::string("SELECT ") + kSummaryColumns + "WHERE m.code = ?");
        q.bind(1, matchId);
        if (!q.executeStep()) return std::nullopt;
        return readSummary(q);
    });
}

std::optional<Match> ClubRepository::loadMatch(const std::string& matchId) const {
    return guarded("cannot load match", [&]() -> std::optional<Match> {
        SQLite::Statement q(*m_db,
                            "SELECT id, code, date, competition, venue, us, opponent, goals_us, "
                            "goals_opp, length_m, width_m, source_frame, extra, zone_grid "
                            "FROM match WHERE code = ?");
        q.bind(1, matchId);
        if (!q.executeStep()) return std::nullopt;
        Match m;
        const std::int64_t row = q.getColumn(0).getInt64();
        MatchInfo& info = m.info;
        info.id = q.getColumn(1).getString();
        info.date = q.getColumn(2).getString();
        info.competition = q.getColumn(3).getString();
        info.venue = q.getColumn(4).getString();
        info.us = q.getColumn(5).getString();
        info.opponent = q.getColumn(6).getString();
        info.goalsUs = optionalInt(q.getColumn(7));
        info.goalsOpp = optionalInt(q.getColumn(8));
        info.pitch = {q.getColumn(9).getDouble(), q.getColumn(10).getDouble()};
        info.sourceFrame = frameFromString(q.getColumn(11).getString()).value_or(Frame::Acting);
        info.extra = q.getColumn(12).isNull() ? "" : q.getColumn(12).getString();
        info.zoneOnlyGrid = q.getColumn(13).getString();

        SQLite::Statement p(*m_db, "SELECT n, length_s FROM period WHERE match_id = ? ORDER BY n");
        p.bind(1, row);
        while (p.executeStep())
            info.periods.push_back({p.getColumn(0).getInt(), p.getColumn(1).getDouble()});

        SQLite::Statement e(*m_db,
                            "SELECT file_index, period, t, side, player, type, result, x, y, "
                            "to_x, to_y, tags, extra FROM event WHERE match_id = ? ORDER BY seq");
        e.bind(1, row);
        while (e.executeStep()) {
            Event ev;
            ev.fileIndex = e.getColumn(0).getInt();
            ev.period = e.getColumn(1).getInt();
            ev.t = e.getColumn(2).getDouble();
            ev.side = sideFromString(e.getColumn(3).getString()).value_or(Side::Us);
            ev.player = e.getColumn(4).getString();
            const std::string type = e.getColumn(5).getString();
            auto t = eventTypeFromString(type);
            if (!t) throw StorageError("stored event has unknown type '" + type + "'");
            ev.type = *t;
            ev.result = resultFromString(e.getColumn(6).getString()).value_or(Result::None);
            ev.at = {e.getColumn(7).getDouble(), e.getColumn(8).getDouble()};
            if (!e.getColumn(9).isNull())
                ev.to = Point{e.getColumn(9).getDouble(), e.getColumn(10).getDouble()};
            if (!e.getColumn(11).isNull())
                ev.tags = nlohmann::json::parse(e.getColumn(11).getString())
                              .get<std::vector<std::string>>();
            if (!e.getColumn(12).isNull()) ev.extra = e.getColumn(12).getString();
            m.events.push_back(std::move(ev));
        }
        return m;
    });
}

void ClubRepository::storeMatch(const Match& match, const SourceFile& source,
                                const std::string& squad, bool replace) {
    const auto specs = metrics();
    guarded("cannot store match", [&] {
        SQLite::Transaction tx(*m_db);
        const MatchInfo& info = match.info;
        if (replace) {
            SQLite::Statement del(*m_db, "DELETE FROM match WHERE code = ?");
            del.bind(1, info.id);
            del.exec();
        }
        // Club, squad and season are found or made on the fly.
        {
            // A club row made before any match (targets set before the season) has no name
            // yet: the first match names it.
            SQLite::Statement q(*m_db, "INSERT OR IGNORE INTO club(name) SELECT ? WHERE NOT "
                                       "EXISTS (SELECT 1 FROM club)");
            q.bind(1, info.us);
            q.exec();
            SQLite::Statement name(*m_db, "UPDATE club SET name = ? WHERE name = ''");
            name.bind(1, info.us);
            name.exec();
        }
        const std::int64_t clubId = m_db->execAndGet("SELECT min(id) FROM club").getInt64();
        {
            SQLite::Statement q(*m_db, "INSERT OR IGNORE INTO squad(club_id, name) VALUES (?, ?)");
            q.bind(1, clubId);
            q.bind(2, squad);
            q.exec();
        }
        SQLite::Statement sq(*m_db, "SELECT id FROM squad WHERE club_id = ? AND name = ?");
        sq.bind(1, clubId);
        sq.bind(2, squad);
        sq.executeStep();
        const std::int64_t squadId = sq.getColumn(0).getInt64();
        std::int64_t seasonId = 0;
        {
            SQLite::Statement q(*m_db, "SELECT id FROM season WHERE squad_id = ? AND starts <= ? "
                                       "AND ends >= ? ORDER BY starts DESC LIMIT 1");
            q.bind(1, squadId);
            q.bind(2, info.date);
            q.bind(3, info.date);
            if (q.executeStep()) {
                seasonId = q.getColumn(0).getInt64();
            } else {
                const std::string name = seasonOf(info.date);
                const int first = std::stoi(name.substr(0, 4));
                SQLite::Statement ins(*m_db, "INSERT INTO season(squad_id, name, starts, ends) "
                                             "VALUES (?, ?, ?, ?)");
                ins.bind(1, squadId);
                ins.bind(2, name);
                ins.bind(3, std::to_string(first) + "-07-01");
                ins.bind(4, std::to_string(first + 1) + "-06-30");
                ins.exec();
                seasonId = m_db->getLastInsertRowid();
            }
        }
        SQLite::Statement ins(*m_db,
                              "INSERT INTO match(code, season_id, date, competition, venue, us, "
                              "opponent, goals_us, goals_opp, length_m, width_m, source_frame, "
                              "extra, source_name, source_hash, ingested_at, zone_grid) "
                              "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
        ins.bind(1, info.id);
        ins.bind(2, seasonId);
        ins.bind(3, info.date);
        ins.bind(4, info.competition);
        ins.bind(5, info.venue);
        ins.bind(6, info.us);
        ins.bind(7, info.opponent);
        bindOptionalInt(ins, 8, info.goalsUs);
        bindOptionalInt(ins, 9, info.goalsOpp);
        ins.bind(10, info.pitch.lengthM);
        ins.bind(11, info.pitch.widthM);
        ins.bind(12, std::string(toString(info.sourceFrame)));
        if (info.extra.empty()) ins.bind(13);
        else ins.bind(13, info.extra);
        ins.bind(14, source.name);
        ins.bind(15, source.hash);
        ins.bind(16, source.ingestedAt.empty() ? systemNowUtcIso() : source.ingestedAt);
        ins.bind(17, info.zoneOnlyGrid);
        ins.exec();
        const std::int64_t row = m_db->getLastInsertRowid();

        SQLite::Statement per(*m_db, "INSERT INTO period(match_id, n, length_s) VALUES (?, ?, ?)");
        for (const auto& p : info.periods) {
            per.reset();
            per.bind(1, row);
            per.bind(2, p.n);
            per.bind(3, p.lengthS);
            per.exec();
        }
        SQLite::Statement ev(*m_db,
                             "INSERT INTO event(match_id, seq, file_index, period, t, side, "
                             "player, type, result, x, y, to_x, to_y, tags, extra) "
                             "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
        int seq = 0;
        for (const Event& e : match.events) {
            ev.reset();
            ev.clearBindings();
            ev.bind(1, row);
            ev.bind(2, seq++);
            ev.bind(3, e.fileIndex);
            ev.bind(4, e.period);
            ev.bind(5, e.t);
            ev.bindNoCopy(6, toString(e.side).data());
            ev.bind(7, e.player);
            ev.bindNoCopy(8, toString(e.type).data());
            ev.bindNoCopy(9, toString(e.result).data());
            ev.bind(10, e.at.x);
            ev.bind(11, e.at.y);
            if (e.to) {
                ev.bind(12, e.to->x);
                ev.bind(13, e.to->y);
            }
            if (!e.tags.empty()) ev.bind(14, nlohmann::json(e.tags).dump());
            if (!e.extra.empty()) ev.bind(15, e.extra);
            ev.exec();
        }
        writeTallies(row, match, specs);
        tx.commit();
        return 0;
    });
}

void ClubRepository::writeTallies(std::int64_t matchRowId, const Match& match,
                                  const std::vector<MetricSpec>& specs) {
    const ZoneGrid grid = tallyGrid();
    const MatchFacts facts(match);
    SQLite::Statement del(*m_db, "DELETE FROM tally WHERE match_id = ? AND metric_id = ?");
    SQLite::Statement ins(*m_db, "INSERT INTO tally(match_id, metric_id, band, lane, num, den) "
                                 "VALUES (?, ?, ?, ?, ?, ?)");
    for (const auto& spec : specs) {
        del.reset();
        del.bind(1, matchRowId);
        del.bind(2, spec.id);
        del.exec();
        const MatchTally tally = computeTally(facts, spec, grid);
        for (int i = 0; i < grid.zoneCount(); ++i) {
            const ZoneTally& z = tally[static_cast<std::size_t>(i)];
            if (z.num == 0 && z.den == 0) continue;
            const Zone zone = grid.zoneAt(i);
            ins.reset();
            ins.bind(1, matchRowId);
            ins.bind(2, spec.id);
            ins.bind(3, zone.band);
            ins.bind(4, zone.lane);
            ins.bind(5, static_cast<std::int64_t>(z.num));
            ins.bind(6, static_cast<std::int64_t>(z.den));
            ins.exec();
        }
    }
}

std::vector<TallyRow> ClubRepository::tallies(const std::optional<std::string>& matchId,
                                              const std::optional<std::string>& metricId) const {
    return guarded("cannot read tallies", [&] {
        std::vector<TallyRow> out;
        SQLite::Statement q(*m_db,
                            "SELECT m.code, t.metric_id, t.band, t.lane, t.num, t.den "
                            "FROM tally t JOIN match m ON m.id = t.match_id "
                            "JOIN metric k ON k.id = t.metric_id "
                            "WHERE t.den <> 0 AND (?1 IS NULL OR m.code = ?1) "
                            "AND (?2 IS NULL OR t.metric_id = ?2) "
                            "ORDER BY m.date, m.code, k.position, t.band, t.lane");
        if (matchId) q.bind(1, *matchId);
        if (metricId) q.bind(2, *metricId);
        while (q.executeStep())
            out.push_back({q.getColumn(0).getString(), q.getColumn(1).getString(),
                           q.getColumn(2).getInt(), q.getColumn(3).getInt(),
                           static_cast<long>(q.getColumn(4).getInt64()),
                           static_cast<long>(q.getColumn(5).getInt64())});
        return out;
    });
}

std::vector<TallyRow> ClubRepository::talliesOnGrid(
    const ZoneGrid& grid, const std::optional<std::string>& matchId,
    const std::optional<std::string>& metricId) const {
    if (grid == tallyGrid()) return tallies(matchId, metricId);
    std::vector<MetricSpec> specs = metrics();
    if (metricId) std::erase_if(specs, [&](const MetricSpec& s) { return s.id != *metricId; });
    std::vector<TallyRow> out;
    for (const auto& summary : matches()) {
        if (matchId && summary.id != *matchId) continue;
        const auto match = loadMatch(summary.id);
        const MatchFacts facts(*match);
        for (const auto& spec : specs) {
            const MatchTally tally = computeTally(facts, spec, grid);
            for (int i = 0; i < grid.zoneCount(); ++i) {
                const ZoneTally& z = tally[static_cast<std::size_t>(i)];
                if (z.den == 0) continue;
                const Zone zone = grid.zoneAt(i);
                out.push_back({summary.id, spec.id, zone.band, zone.lane, z.num, z.den});
            }
        }
    }
    return out;
}

MatchTally ClubRepository::matchTally(const std::string& matchId,
                                      const std::string& metricId) const {
    const ZoneGrid grid = tallyGrid();
    return guarded("cannot read tallies", [&] {
        MatchTally out(static_cast<std::size_t>(grid.zoneCount()));
        SQLite::Statement q(*m_db, "SELECT t.band, t.lane, t.num, t.den FROM tally t JOIN match "
                                   "m ON m.id = t.match_id WHERE m.code = ? AND t.metric_id = ?");
        q.bind(1, matchId);
        q.bind(2, metricId);
        while (q.executeStep()) {
            const Zone z{q.getColumn(0).getInt(), q.getColumn(1).getInt()};
            if (z.band < 1 || z.band > grid.bands() || z.lane < 1 || z.lane > grid.lanes())
                continue;
            out[static_cast<std::size_t>(grid.indexOf(z))] = {
                static_cast<long>(q.getColumn(2).getInt64()),
                static_cast<long>(q.getColumn(3).getInt64())};
        }
        return out;
    });
}

void ClubRepository::recomputeTallies(const std::optional<std::string>& metricId) {
    std::vector<MetricSpec> specs = metrics();
    if (metricId)
        std::erase_if(specs, [&](const MetricSpec& s) { return s.id != *metricId; });
    guarded("cannot recompute tallies", [&] {
        SQLite::Transaction tx(*m_db);
        std::vector<std::pair<std::int64_t, std::string>> rows;
        SQLite::Statement q(*m_db, "SELECT id, code FROM match");
        while (q.executeStep()) rows.emplace_back(q.getColumn(0).getInt64(), q.getColumn(1).getString());
        for (const auto& [row, code] : rows) writeTallies(row, *loadMatch(code), specs);
        tx.commit();
        return 0;
    });
}

std::optional<std::pair<std::string, std::string>>
ClubRepository::seasonOfMatch(const std::string& matchId) const {
    return guarded("cannot read match", [&]() -> std::optional<std::pair<std::string, std::string>> {
        SQLite::Statement q(*m_db, "SELECT sq.name, se.name FROM match m JOIN season se ON "
                                   "se.id = m.season_id JOIN squad sq ON sq.id = se.squad_id "
                                   "WHERE m.code = ?");
        q.bind(1, matchId);
        if (!q.executeStep()) return std::nullopt;
        return std::pair{q.getColumn(0).getString(), q.getColumn(1).getString()};
    });
}

std::vector<std::string> ClubRepository::seasons(const std::string& squad) const {
    return guarded("cannot read seasons", [&] {
        std::vector<std::string> out;
        SQLite::Statement q(*m_db, "SELECT se.name FROM season se JOIN squad sq ON sq.id = "
                                   "se.squad_id WHERE sq.name = ? ORDER BY se.starts");
        q.bind(1, squad);
        while (q.executeStep()) out.push_back(q.getColumn(0).getString());
        return out;
    });
}

namespace {

std::int64_t findOrMakeSquad(SQLite::Database& db, const std::string& squad) {
    db.exec("INSERT INTO club(name) SELECT '' WHERE NOT EXISTS (SELECT 1 FROM club)");
    const std::int64_t clubId = db.execAndGet("SELECT min(id) FROM club").getInt64();
    SQLite::Statement sq(db, "INSERT OR IGNORE INTO squad(club_id, name) VALUES (?, ?)");
    sq.bind(1, clubId);
    sq.bind(2, squad);
    sq.exec();
    SQLite::Statement find(db, "SELECT id FROM squad WHERE club_id = ? AND name = ?");
    find.bind(1, clubId);
    find.bind(2, squad);
    find.executeStep();
    return find.getColumn(0).getInt64();
}

} // namespace

// A match's video clock is kept as a setting "video.<match id>" = "1=0;2=2850" (period=seconds).
std::map<int, double> ClubRepository::videoPeriodStarts(const std::string& matchId) const {
    return guarded("cannot read the video's period starts", [&] {
        std::map<int, double> out;
        SQLite::Statement q(*m_db, "SELECT value FROM setting WHERE key = ?");
        q.bind(1, "video." + matchId);
        if (!q.executeStep()) return out;
        const std::string text = q.getColumn(0).getString();
        std::size_t pos = 0;
        while (pos < text.size()) {
            const std::size_t end = std::min(text.find(';', pos), text.size());
            const std::string part = text.substr(pos, end - pos);
            const std::size_t eq = part.find('=');
            if (eq != std::string::npos) {
                try {
                    out[std::stoi(part.substr(0, eq))] = std::stod(part.substr(eq + 1));
                } catch (const std::exception&) {
                    // a hand-edited value that does not read is left out
                }
            }
            pos = end + 1;
        }
        return out;
    });
}

void ClubRepository::saveVideoPeriodStarts(const std::string& matchId, const std::map<int, double>& starts) {
    guarded("cannot save the video's period starts", [&] {
        std::string value;
        for (const auto& [period, seconds] : starts) {
            char buf[48];
            std::snprintf(buf, sizeof buf, "%s%d=%.3f", value.empty() ? "" : ";", period, seconds);
            value += buf;
        }
        SQLite::Statement q(*m_db, "INSERT INTO setting(key, value) VALUES (?, ?) "
                                   "ON CONFLICT(key) DO UPDATE SET value = excluded.value");
        q.bind(1, "video." + matchId);
        q.bind(2, value);
        q.exec();
    });
}

std::vector<Player> ClubRepository::squadList(const std::string& squad) const {
    return guarded("cannot read the squad list", [&] {
        std::vector<Player> out;
        SQLite::Statement q(*m_db, "SELECT p.number, p.name, p.position FROM squad_player p JOIN squad sq ON "
                                   "sq.id = p.squad_id WHERE sq.name = ? ORDER BY length(p.number), p.number");
        q.bind(1, squad);
        while (q.executeStep())
            out.push_back({q.getColumn(0).getString(), q.getColumn(1).getString(), q.getColumn(2).getString()});
        return out;
    });
}

void ClubRepository::replaceSquadList(const std::string& squad, const std::vector<Player>& players) {
    guarded("cannot save the squad list", [&] {
        SQLite::Transaction tx(*m_db);
        const std::int64_t squadId = findOrMakeSquad(*m_db, squad);
        SQLite::Statement del(*m_db, "DELETE FROM squad_player WHERE squad_id = ?");
        del.bind(1, squadId);
        del.exec();
        SQLite::Statement ins(*m_db, "INSERT INTO squad_player(squad_id, number, name, position) VALUES (?, ?, ?, ?)");
        for (const Player& p : players) {
            ins.bind(1, squadId);
            ins.bind(2, p.number);
            ins.bind(3, p.name);
            ins.bind(4, p.position);
            ins.exec();
            ins.reset();
        }
        tx.commit();
    });
}

namespace {

std::int64_t findOrMakeSeason(SQLite::Database& db, const std::string& squad,
                              const std::string& season) {
    // A club row may exist before any match names it (targets are set before the season).
    db.exec("INSERT INTO club(name) SELECT '' WHERE NOT EXISTS (SELECT 1 FROM club)");
    const std::int64_t clubId = db.execAndGet("SELECT min(id) FROM club").getInt64();
    SQLite::Statement sq(db, "INSERT OR IGNORE INTO squad(club_id, name) VALUES (?, ?)");
    sq.bind(1, clubId);
    sq.bind(2, squad);
    sq.exec();
    SQLite::Statement find(db, "SELECT se.id FROM season se JOIN squad sq ON sq.id = se.squad_id "
                               "WHERE sq.name = ? AND se.name = ?");
    find.bind(1, squad);
    find.bind(2, season);
    if (find.executeStep()) return find.getColumn(0).getInt64();
    int first = 0;
    try {
        first = std::stoi(season.substr(0, 4));
    } catch (const std::exception&) {
        first = 0;
    }
    if (season.size() != 7 || season[4] != '-' || first < 1900 ||
        seasonOf(std::to_string(first) + "-08-01") != season)
        throw StorageError("'" + season + "' is not a season name such as 2026-27");
    SQLite::Statement ins(db, "INSERT INTO season(squad_id, name, starts, ends) SELECT id, ?, ?, ? "
                              "FROM squad WHERE club_id = ? AND name = ?");
    ins.bind(1, season);
    ins.bind(2, std::to_string(first) + "-07-01");
    ins.bind(3, std::to_string(first + 1) + "-06-30");
    ins.bind(4, clubId);
    ins.bind(5, squad);
    ins.exec();
    return db.getLastInsertRowid();
}

Target readTarget(SQLite::Statement& q) {
    Target t;
    t.version = q.getColumn(0).getInt64();
    t.key.squad = q.getColumn(1).getString();
    t.key.season = q.getColumn(2).getString();
    t.key.metric = q.getColumn(3).getString();
    t.key.band = q.getColumn(4).getInt();
    t.key.lane = q.getColumn(5).getInt();
    t.direction = directionFromString(q.getColumn(6).getString()).value_or(Direction::AtLeast);
    t.value = q.getColumn(7).getDouble();
    t.watchMargin = q.getColumn(8).getDouble();
    t.minSample = static_cast<long>(q.getColumn(9).getInt64());
    t.author = q.getColumn(10).getString();
    t.rationale = q.getColumn(11).getString();
    t.effectiveFrom = q.getColumn(12).getString();
    t.recordedAt = q.getColumn(13).getString();
    t.retired = q.getColumn(14).getInt() != 0;
    return t;
}

const char* kTargetSelect =
    "SELECT t.id, sq.name, se.name, t.metric_id, t.band, t.lane, t.direction, t.value, "
    "t.watch_margin, t.min_sample, t.author, t.rationale, t.effective_from, t.recorded_at, "
    "t.retired FROM target t JOIN season se ON se.id = t.season_id JOIN squad sq ON "
    "sq.id = se.squad_id ";

} // namespace

void ClubRepository::ensureSeason(const std::string& squad, const std::string& season) {
    guarded("cannot make season", [&] {
        SQLite::Transaction tx(*m_db);
        findOrMakeSeason(*m_db, squad, season);
        tx.commit();
        return 0;
    });
}

std::vector<Target> ClubRepository::targets(const std::string& squad,
                                            const std::string& season) const {
    return guarded("cannot read targets", [&] {
        std::vector<Target> out;
        SQLite::Statement q(*m_db, std::string(kTargetSelect) +
                                       "WHERE sq.name = ? AND se.name = ? AND "
                                       "(t.grid = '' OR t.grid = ?) ORDER BY t.id");
        q.bind(1, squad);
        q.bind(2, season);
        q.bind(3, tallyGrid().name());
        while (q.executeStep()) out.push_back(readTarget(q));
        return out;
    });
}

std::vector<Target> ClubRepository::allTargets(const std::optional<ZoneGrid>& grid) const {
    const std::string name = (grid ? *grid : tallyGrid()).name();
    return guarded("cannot read targets", [&] {
        std::vector<Target> out;
        SQLite::Statement q(*m_db, std::string(kTargetSelect) +
                                       "WHERE t.grid = '' OR t.grid = ? ORDER BY t.id");
        q.bind(1, name);
        while (q.executeStep()) out.push_back(readTarget(q));
        return out;
    });
}

std::vector<std::int64_t> ClubRepository::addTargets(const std::vector<Target>& versions,
                                                     const std::string& now) {
    return guarded("cannot save targets", [&] {
        SQLite::Transaction tx(*m_db);
        auto ids = insertTargets(versions, now);
        tx.commit();
        return ids;
    });
}

std::vector<std::int64_t> ClubRepository::insertTargets(const std::vector<Target>& versions,
                                                        const std::string& now) {
    std::vector<std::int64_t> ids;
    const std::string grid = tallyGrid().name();
    SQLite::Statement ins(*m_db,
                          "INSERT INTO target(season_id, metric_id, band, lane, direction, "
                          "value, watch_margin, min_sample, author, rationale, "
                          "effective_from, recorded_at, retired, grid) "
                          "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
    for (const Target& t : versions) {
        const std::int64_t season = findOrMakeSeason(*m_db, t.key.squad, t.key.season);
        ins.reset();
        ins.bind(1, season);
        ins.bind(2, t.key.metric);
        ins.bind(3, t.key.band);
        ins.bind(4, t.key.lane);
        ins.bind(5, std::string(toString(t.direction)));
        ins.bind(6, t.value);
        ins.bind(7, t.watchMargin);
        ins.bind(8, static_cast<std::int64_t>(t.minSample));
        ins.bind(9, t.author);
        ins.bind(10, t.rationale);
        ins.bind(11, t.effectiveFrom);
        ins.bind(12, t.recordedAt.empty() ? now : t.recordedAt);
        ins.bind(13, t.retired ? 1 : 0);
        ins.bind(14, t.key.band == 0 && t.key.lane == 0 ? std::string() : grid);
        ins.exec();
        ids.push_back(m_db->getLastInsertRowid());
    }
    return ids;
}

SeasonTallies ClubRepository::seasonTallies(const std::string& squad, const std::string& season,
                                            const ZoneGrid& grid) const {
    if (grid == tallyGrid()) return seasonTallies(squad, season);
    SeasonTallies out = seasonTallies(squad, season);
    const auto specs = metrics();
    for (auto& [metric, perMatch] : out.byMetric)
        perMatch.assign(out.matchIds.size(), MatchTally(static_cast<std::size_t>(grid.zoneCount())));
    for (std::size_t i = 0; i < out.matchIds.size(); ++i) {
        const auto match = loadMatch(out.matchIds[i]);
        if (!match) continue;
        const MatchFacts facts(*match);
        for (const auto& spec : specs)
            out.byMetric[spec.id][i] = computeTally(facts, spec, grid);
    }
    return out;
}

std::vector<MatchExposure> ClubRepository::seasonExposures(const std::string& squad,
                                                         const std::string& season) const {
    return guarded("cannot read the season's minutes and passes", [&] {
        std::vector<MatchExposure> out;
        SQLite::Statement q(*m_db,
                            "SELECT (SELECT COALESCE(SUM(p.length_s), 0) FROM period p WHERE p.match_id = m.id), "
                            "(SELECT COUNT(*) FROM event e WHERE e.match_id = m.id AND e.side = 'opp' AND "
                            "e.type = 'pass') FROM match m JOIN season se ON se.id = m.season_id "
                            "JOIN squad sq ON sq.id = se.squad_id WHERE sq.name = ? AND se.name = ? "
                            "ORDER BY m.date, m.code");
        q.bind(1, squad);
        q.bind(2, season);
        while (q.executeStep())
            out.push_back({q.getColumn(0).getDouble() / 60, q.getColumn(1).getInt64()});
        return out;
    });
}

SeasonTallies ClubRepository::seasonTallies(const std::string& squad,
                                            const std::string& season) const {
    const ZoneGrid grid = tallyGrid();
    const auto specs = metrics();
    return guarded("cannot read season tallies", [&] {
        SeasonTallies out;
        std::map<std::int64_t, std::size_t> position;
        SQLite::Statement q(*m_db, "SELECT m.id, m.code, m.date FROM match m JOIN season se ON "
                                   "se.id = m.season_id JOIN squad sq ON sq.id = se.squad_id "
                                   "WHERE sq.name = ? AND se.name = ? ORDER BY m.date, m.code");
        q.bind(1, squad);
        q.bind(2, season);
        while (q.executeStep()) {
            position[q.getColumn(0).getInt64()] = out.matchIds.size();
            out.matchIds.push_back(q.getColumn(1).getString());
            out.dates.push_back(q.getColumn(2).getString());
        }
        for (const auto& spec : specs)
            out.byMetric[spec.id].assign(out.matchIds.size(),
                                         MatchTally(static_cast<std::size_t>(grid.zoneCount())));
        // One lookup per match along the tally key (match_id, ...), not a scan of every tally.
        SQLite::Statement t(*m_db, "SELECT t.match_id, t.metric_id, t.band, t.lane, t.num, t.den "
                                   "FROM tally t WHERE t.match_id IN (SELECT m.id FROM match m "
                                   "JOIN season se ON se.id = m.season_id JOIN squad sq ON "
                                   "sq.id = se.squad_id WHERE sq.name = ? AND se.name = ?)");
        t.bind(1, squad);
        t.bind(2, season);
        while (t.executeStep()) {
            auto metric = out.byMetric.find(t.getColumn(1).getString());
            const Zone z{t.getColumn(2).getInt(), t.getColumn(3).getInt()};
            if (metric == out.byMetric.end() || z.band < 1 || z.band > grid.bands() ||
                z.lane < 1 || z.lane > grid.lanes())
                continue;
            auto& zone = metric->second[position[t.getColumn(0).getInt64()]]
                                       [static_cast<std::size_t>(grid.indexOf(z))];
            zone.num = static_cast<long>(t.getColumn(4).getInt64());
            zone.den = static_cast<long>(t.getColumn(5).getInt64());
        }
        return out;
    });
}

FlagSettings ClubRepository::flagSettings() const {
    return guarded("cannot read settings", [&] {
        FlagSettings f;
        SQLite::Statement q(*m_db, "SELECT key, value FROM setting WHERE key LIKE 'flags.%'");
        while (q.executeStep()) {
            const std::string key = q.getColumn(0).getString();
            const std::string value = q.getColumn(1).getString();
            try {
                if (key == "flags.level") f.level = std::stod(value);
                else if (key == "flags.off_threshold") f.offThreshold = std::stod(value);
                else if (key == "flags.watch_threshold") f.watchThreshold = std::stod(value);
                else if (key == "flags.fdr") f.fdr = value == "on";
                else if (key == "flags.fdr_q") f.fdrQ = std::stod(value);
                else if (key == "flags.false_flags_per_season") f.falseFlagsPerSeason = std::stod(value);
                else if (key == "flags.season_matches") f.seasonMatches = std::stoi(value);
                else if (key == "flags.match_variation") f.matchVariation = value != "off";
                else if (key == "flags.interval")
                    f.rateInterval = value == "jeffreys" ? IntervalMethod::Jeffreys
                                                         : IntervalMethod::Wilson;
                else if (key == "flags.window") {
                    if (auto w = Window::parse(value)) f.window = *w;
                }
            } catch (const std::exception&) {
                // A damaged value keeps its default; `settings` shows what is in force.
            }
        }
        return f;
    });
}

void ClubRepository::saveFlagSettings(const FlagSettings& f,
                                      const std::vector<std::pair<std::string, std::string>>& more) {
    guarded("cannot save settings", [&] {
        SQLite::Transaction tx(*m_db);
        SQLite::Statement q(*m_db, "INSERT INTO setting(key, value) VALUES (?, ?) "
                                   "ON CONFLICT(key) DO UPDATE SET value = excluded.value");
        auto put = [&](const char* key, const std::string& value) {
            q.reset();
            q.bind(1, key);
            q.bind(2, value);
            q.exec();
        };
        auto num = [](double v) {
            char buf[32];
            std::snprintf(buf, sizeof buf, "%.10g", v);
            return std::string(buf);
        };
        put("flags.level", num(f.level));
        put("flags.off_threshold", num(f.offThreshold));
        put("flags.watch_threshold", num(f.watchThreshold));
        put("flags.fdr", f.fdr ? "on" : "off");
        put("flags.fdr_q", num(f.fdrQ));
        put("flags.false_flags_per_season", num(f.falseFlagsPerSeason));
        put("flags.season_matches", std::to_string(f.seasonMatches));
        put("flags.match_variation", f.matchVariation ? "on" : "off");
        put("flags.interval", f.rateInterval == IntervalMethod::Jeffreys ? "jeffreys" : "wilson");
        put("flags.window", f.window.name());
        for (const auto& [key, value] : more) put(key.c_str(), value);
        tx.commit();
        return 0;
    });
}

int ClubRepository::changeGrid(const ZoneGrid& to, const std::string& by,
                               const std::string& now,
                               const std::function<void(int, int)>& progress) {
    const ZoneGrid from = tallyGrid();
    if (from == to) return 0;
    if (by.find_first_not_of(" \t\r\n") == std::string::npos)
        throw StorageError("cannot change the zone grid: say who changes it");
    const std::vector<MetricSpec> specs = metrics();
    const TargetCarry carry = carryTargets(allTargets(from), allTargets(to), from, to);
    return guarded("cannot change the zone grid", [&] {
        SQLite::Transaction tx(*m_db);
        SQLite::Statement set(*m_db, "UPDATE setting SET value = ? WHERE key = 'tally_grid'");
        set.bind(1, to.name());
        if (set.exec() == 0) {
            SQLite::Statement ins(*m_db, "INSERT INTO setting(key, value) VALUES ('tally_grid', ?)");
            ins.bind(1, to.name());
            ins.exec();
        }
        // From here on tallyGrid() reads `to` inside this transaction.
        std::vector<std::pair<std::int64_t, std::string>> rows;
        SQLite::Statement q(*m_db, "SELECT id, code FROM match ORDER BY date, code");
        while (q.executeStep())
            rows.emplace_back(q.getColumn(0).getInt64(), q.getColumn(1).getString());
        m_db->exec("DELETE FROM tally");
        int done = 0;
        for (const auto& [row, code] : rows) {
            writeTallies(row, *loadMatch(code), specs);
            if (progress) progress(++done, static_cast<int>(rows.size()));
        }
        insertTargets(carry.versions, now);
        SQLite::Statement log(*m_db, "INSERT INTO grid_change(from_grid, to_grid, changed_by, "
                                     "changed_at, summary) VALUES (?, ?, ?, ?, ?)");
        log.bind(1, from.name());
        log.bind(2, to.name());
        log.bind(3, by);
        log.bind(4, now);
        log.bind(5, std::to_string(rows.size()) + " matches counted again; " +
                        std::to_string(carry.versions.size()) + " target versions carried to " +
                        std::to_string(carry.zonesCarried) + " zones; " +
                        std::to_string(carry.zonesKept) + " zones kept their earlier targets");
        log.exec();
        tx.commit();
        return static_cast<int>(carry.versions.size());
    });
}

std::vector<ClubRepository::GridChange> ClubRepository::gridChanges() const {
    return guarded("cannot read grid changes", [&] {
        std::vector<GridChange> out;
        SQLite::Statement q(*m_db, "SELECT from_grid, to_grid, changed_by, changed_at, summary "
                                   "FROM grid_change ORDER BY id");
        while (q.executeStep())
            out.push_back({q.getColumn(0).getString(), q.getColumn(1).getString(),
                           q.getColumn(2).getString(), q.getColumn(3).getString(),
                           q.getColumn(4).getString()});
        return out;
    });
}

void ClubRepository::backupTo(const std::string& target) const {
    guarded("cannot back up club file", [&] {
        SQLite::Database out(target, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        SQLite::Backup backup(out, *m_db);
        backup.executeStep(-1);
        return 0;
    });
}

} // namespace pitchloop::model
