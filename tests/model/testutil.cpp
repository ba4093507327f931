#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>

#include <algorithm>
#include <random>

namespace pitchloop::testutil {

using namespace pitchloop::model;

Match makeMatch(std::vector<Event> events, double periodLengthS) {
    Match m;
    m.info.id = "TEST-01";
    m.info.date = "2026-08-08";
    m.info.venue = "home";
    m.info.us = "Kestrel Bay";
    m.info.opponent = "Test Opponents";
    m.info.pitch = {105, 68};
    m.info.periods = {{1, periodLengthS}, {2, periodLengthS}};
    for (std::size_t i = 0; i < events.size(); ++i) events[i].fileIndex = static_cast<int>(i);
    m.events = std::move(events);
    return m;
}

Event ev(Side side, EventType type, Result result, double t, double x, double y, int period) {
    Event e;
    e.side = side;
    e.type = type;
    e.result = result;
    e.t = t;
    e.at = {x, y};
    e.period = period;
    return e;
}

std::string dataSnapshot(const std::string& sqliteFile) {
    SQLite::Database db(sqliteFile, SQLite::OPEN_READONLY);
    std::string out;
    SQLite::Statement tables(db, "SELECT name FROM sqlite_master WHERE type = 'table' "
                                 "ORDER BY name");
    std::vector<std::string> names;
    while (tables.executeStep()) names.push_back(tables.getColumn(0).getString());
    for (const auto& name : names) {
        out += "## " + name + "\n";
        SQLite::Statement rows(db, "SELECT * FROM \"" + name + "\"");
        std::vector<std::string> lines;
        while (rows.executeStep()) {
            std::string line;
            for (int c = 0; c < rows.getColumnCount(); ++c) {
                const auto col = rows.getColumn(c);
                line += col.isNull() ? "NULL" : col.getString();
                line += '|';
            }
            lines.push_back(std::move(line));
        }
        std::sort(lines.begin(), lines.end());
        for (auto& l : lines) out += l + "\n";
    }
    out += "## user_version " + db.execAndGet("PRAGMA user_version").getString() + "\n";
    return out;
}

std::filesystem::path freshTempDir(const std::string& name) {
    std::random_device rd;
    auto dir = std::filesystem::temp_directory_path() /
               ("pitchloop-test-" + name + "-" + std::to_string(rd()));
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    return dir;
}

std::filesystem::path sourcePath(const std::string& relative) {
    return std::filesystem::path(PITCHLOOP_SOURCE_DIR) / relative;
}

} // namespace pitchloop::testutil
