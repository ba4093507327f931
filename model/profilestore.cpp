#include "profilestore.h"
#include "storeguard.h"

#include <SQLiteCpp/Column.h>
#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>

#include <algorithm>
#include <cctype>

namespace pitchloop::model {

Problems ProfileStore::save(const std::string& name, const std::string& text, const std::string& by,
                            const std::string& now) {
    const ProfileResult parsed = parseProfile(text, name);
    if (!parsed.profile) return parsed.errors;
    if (name.find_first_not_of(" \t") == std::string::npos)
        return {{name, "", "name", "a saved profile needs a name"}};
    guarded("cannot save the profile", [&] {
        SQLite::Statement q(m_repo.database(),
                            "INSERT INTO import_profile(name, profile, saved_by, saved_at) VALUES (?, ?, ?, ?) "
                            "ON CONFLICT(name) DO UPDATE SET profile = excluded.profile, "
                            "saved_by = excluded.saved_by, saved_at = excluded.saved_at");
        q.bind(1, name);
        q.bind(2, text);
        q.bind(3, by);
        q.bind(4, now);
        q.exec();
        return 0;
    });
    return {};
}

std::vector<SavedProfile> ProfileStore::list() const {
    return guarded("cannot read profiles", [&] {
        std::vector<SavedProfile> out;
        SQLite::Statement q(m_repo.database(),
                            "SELECT name, profile, saved_by, saved_at FROM import_profile ORDER BY name");
        while (q.executeStep())
            out.push_back({q.getColumn(0).getString(), q.getColumn(1).getString(),
                           q.getColumn(2).getString(), q.getColumn(3).getString()});
        return out;
    });
}

std::optional<SavedProfile> ProfileStore::get(const std::string& name) const {
    for (auto& p : list())
        if (p.name == name) return p;
    return std::nullopt;
}

bool ProfileStore::remove(const std::string& name) {
    return guarded("cannot remove the profile", [&] {
        SQLite::Statement q(m_repo.database(), "DELETE FROM import_profile WHERE name = ?");
        q.bind(1, name);
        return q.exec() > 0;
    });
}

std::optional<SavedProfile> profileFor(std::string_view bytes, const std::vector<SavedProfile>& saved) {
    std::optional<SavedProfile> best;
    std::size_t bestColumns = 0;
    for (const auto& s : saved) {
        const ProfileResult parsed = parseProfile(s.text, s.name);
        if (!parsed.profile) continue;
        const MappingProfile& p = *parsed.profile;
        // Only the header matters: a numbered table (no header) fits no layout by itself.
        if (p.table.layout == TableLayout::Delimited && !p.table.header) continue;
        const DecodedText text = decodeText(bytes.substr(0, std::min<std::size_t>(bytes.size(), 1 << 16)),
                                            p.encoding, s.name);
        if (!text.errors.empty()) continue;
        // The first record is enough to know the columns.
        std::string_view head = text.text;
        if (p.table.layout != TableLayout::JsonArray) {
            const auto nl = head.find('\n');
            if (nl != std::string_view::npos) head = head.substr(0, nl + 1);
        }
        const TableResult table = parseTable(head, p.table, s.name);
        if (!table.errors.empty() && p.table.layout != TableLayout::Delimited) continue;
        std::size_t named = 0;
        bool fits = true;
        auto check = [&](const std::string& column) {
            if (table.table.column(column)) ++named;
            else fits = false;
        };
        for (const auto& [field, column] : p.columns) check(column);
        for (const auto& [detail, column] : p.matchColumns) check(column);
        if (fits && named > bestColumns) {
            best = s;
            bestColumns = named;
        }
    }
    return best;
}

bool looksLikeTable(const std::string& fileName) {
    const auto dot = fileName.find_last_of('.');
    if (dot == std::string::npos) return false;
    std::string ext = fileName.substr(dot + 1);
    std::transform(ext.begin(), ext.end(), ext.begin(), [](unsigned char c) { return std::tolower(c); });
    return ext == "csv" || ext == "tsv" || ext == "txt" || ext == "jsonl" || ext == "ndjson";
}

} // namespace pitchloop::model
