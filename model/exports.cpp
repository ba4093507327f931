#include "exports.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <random>

namespace pitchloop::model {

namespace {
constexpr std::string_view kCrlf = "\r\n";
} // namespace

bool looksLikeFormula(std::string_view text) {
    if (text.empty()) return false;
    switch (text.front()) {
    case '=':
    case '+':
    case '-':
    case '@':
    case '\t':
    case '\r':
        return true;
    default:
        return false;
    }
}

std::string csvField(std::string_view text) {
    const bool formula = looksLikeFormula(text);
    if (!formula && text.find_first_of(",\"\r\n") == std::string_view::npos)
        return std::string(text);
    std::string out = "\"";
    if (formula) out += '\'';
    for (char c : text) {
        if (c == '"') out += '"';
        out += c;
    }
    out += '"';
    return out;
}

std::string csvNumber(double value) {
    if (std::isnan(value)) return "";
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.6g", value);
    return buf;
}

std::string statusCsv(const std::string& matchId, const std::vector<ZoneStatus>& statuses) {
    std::string out(kStatusCsvHeader);
    out += kCrlf;
    for (const auto& s : statuses) {
        const bool t = s.target.has_value();
        out += csvField(matchId) + ',' + csvField(s.metric) + ',' + std::to_string(s.band) + ',' +
               std::to_string(s.lane) + ',' + csvField(s.window.name()) + ',' +
               csvNumber(s.sum.num) + ',' + csvNumber(s.sum.den) + ',' + csvNumber(s.value) + ',' +
               csvNumber(s.interval.low) + ',' + csvNumber(s.interval.high) + ',' +
               csvNumber(s.level) + ',' + (t ? csvNumber(s.target->value) : "") + ',' +
               std::string(toString(s.state)) + ',' + csvNumber(s.pMiss) + ',' +
               (t ? std::string(toString(s.target->direction)) : "") + ',' +
               std::to_string(s.sum.matches) + ',' + csvNumber(s.pValue) + ',' +
               (t ? csvNumber(s.chanceOff) : "") + ',' + (t ? (s.bhRejected ? "1" : "0") : "") +
               ',' + csvNumber(s.sum.effNum) + ',' + csvNumber(s.sum.effDen) + ',' +
               csvNumber(s.dispersion) + ',' + (t ? csvNumber(s.offThreshold) : "") + ',' +
               csvNumber(s.matchTail);
        out += kCrlf;
    }
    return out;
}

std::string talliesCsv(const std::vector<TallyRow>& rows) {
    std::string out(kTalliesCsvHeader);
    out += kCrlf;
    for (const auto& r : rows) {
        out += csvField(r.matchId) + ',' + csvField(r.metricId) + ',' + std::to_string(r.band) +
               ',' + std::to_string(r.lane) + ',' + std::to_string(r.num) + ',' +
               std::to_string(r.den);
        out += kCrlf;
    }
    return out;
}

void writeFileAtomically(const std::string& path, const std::string& bytes) {
    namespace fs = std::filesystem;
    const fs::path target(path);
    std::random_device rd;
    const fs::path temp =
        target.parent_path() /
        ("." + target.filename().string() + ".part-" + std::to_string(rd() % 1000000));
    {
        std::ofstream f(temp, std::ios::binary | std::ios::trunc);
        if (!f) throw IoError(path + ": cannot be written (is the folder there and writable?)");
        f.write(bytes.data(), static_cast<std::streamsize>(bytes.size()));
        f.close();
        if (!f) {
            std::error_code ignored;
            fs::remove(temp, ignored);
            throw IoError(path + ": writing failed (disk full?)");
        }
    }
    std::error_code ec;
    fs::rename(temp, target, ec);
    if (ec) {
        std::error_code ignored;
        fs::remove(temp, ignored);
        throw IoError(path + ": cannot be replaced: " + ec.message());
    }
}

std::vector<Window> defaultStatusWindows(const FlagSettings& settings) {
    std::vector<Window> unique;
    for (const Window& w : {Window{Window::Kind::Match, 1, 0.3}, settings.window, Window{Window::Kind::Season, 0, 0.3},
                            Window{Window::Kind::Ewma, 0, 0.3}})
        if (std::find(unique.begin(), unique.end(), w) == unique.end()) unique.push_back(w);
    return unique;
}

} // namespace pitchloop::model
