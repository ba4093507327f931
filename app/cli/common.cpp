#include "common.h"

#include "commands.h"
#include "exports.h"

#include "wording.h"
#include "zonenames.h"

#include "clock.h"

#include <nlohmann/json.hpp>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>

namespace pitchloop::cli {

namespace fs = std::filesystem;
using namespace pitchloop::model;

std::string defaultClubFile() {
    if (const char* env = std::getenv("PITCHLOOP_DB"); env && *env) return env;
    fs::path base;
    if (const char* xdg = std::getenv("XDG_DATA_HOME"); xdg && *xdg) base = xdg;
    else if (const char* home = std::getenv("HOME"); home && *home)
        base = fs::path(home) / ".local" / "share";
    else
        base = fs::current_path();
    return (base / "pitchloop" / "club.sqlite").string();
}

std::unique_ptr<ClubRepository> openClub(const Globals& g) {
    const fs::path path(g.db);
    if (path.has_parent_path()) {
        std::error_code ec;
        fs::create_directories(path.parent_path(), ec);
    }
    return std::make_unique<ClubRepository>(g.db);
}

std::string today() { return model::todayIso(); }

std::string nowUtc() { return model::nowUtcIso(); }

std::optional<double> parseNumber(const std::string& text) {
    if (text.empty()) return std::nullopt;
    std::string s = text;
    bool percent = false;
    if (s.back() == '%') {
        percent = true;
        s.pop_back();
    }
    try {
        std::size_t used = 0;
        const double v = std::stod(s, &used);
        if (used != s.size() || !std::isfinite(v)) return std::nullopt;
        return percent ? v / 100 : v;
    } catch (const std::exception&) {
        return std::nullopt;
    }
}

std::optional<Zone> parseZone(const std::string& text) {
    const auto comma = text.find(',');
    if (comma == std::string::npos) return std::nullopt;
    try {
        std::size_t a = 0, b = 0;
        const int band = std::stoi(text.substr(0, comma), &a);
        const int lane = std::stoi(text.substr(comma + 1), &b);
        if (a != comma || b != text.size() - comma - 1 || band < 1 || lane < 1) return std::nullopt;
        return Zone{band, lane};
    } catch (const std::exception&) {
        return std::nullopt;
    }
}

std::string zoneName(int band, int lane, const ZoneGrid& grid) { return zoneLabel(band, lane, grid); }

std::string formatValue(MetricKind kind, double value) { return words::value(kind, value); }

int deliverFile(const std::string& path, const std::string& bytes, const std::string& what, std::ostream& out,
                std::ostream& err) {
    if (path == "-") {
        out << bytes;
        return kExitOk;
    }
    try {
        model::writeFileAtomically(path, bytes);
    } catch (const model::IoError& e) {
        err << "error: " << e.what() << "\n";
        return kExitBadInput;
    }
    err << "wrote " << what << " to " << path << "\n";
    return kExitOk;
}

} // namespace pitchloop::cli
