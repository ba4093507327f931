#include "exports.h"

#include <cmath>
#include <cstdio>

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

} // namespace pitchloop::model
