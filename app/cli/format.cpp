#include "format.h"

#include <cstdio>
#include <iomanip>
#include <sstream>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

std::string cellText(const MetricSpec& spec, const ZoneTally& z) {
    char buf[32];
    switch (spec.kind()) {
    case MetricKind::Rate:
        if (z.den == 0) return "-";
        std::snprintf(buf, sizeof buf, "%ld/%ld %3.0f%%", z.num, z.den, 100.0 * z.num / z.den);
        return buf;
    case MetricKind::Count:
        std::snprintf(buf, sizeof buf, "%ld", z.num);
        return buf;
    case MetricKind::Exposure:
        if (z.den == 0) return z.num ? std::to_string(z.num) + "/0" : "-";
        std::snprintf(buf, sizeof buf, "%ld/%ld %.2f", z.num, z.den,
                      static_cast<double>(z.num) / z.den);
        return buf;
    }
    return "?";
}

std::string pad(const std::string& s, std::size_t width) {
    // Counts code points so "–" and "≥" do not break the columns.
    std::size_t shown = 0;
    for (unsigned char c : s) shown += (c & 0xC0) != 0x80;
    return shown >= width ? s : s + std::string(width - shown, ' ');
}

} // namespace

std::string padColumn(const std::string& s, std::size_t width) {
    std::size_t shown = 0;
    for (unsigned char c : s) shown += (c & 0xC0) != 0x80;
    return shown >= width ? s + " " : s + std::string(width - shown, ' ');
}

void printZoneTable(std::ostream& out, const MetricSpec& spec, const ZoneGrid& grid,
                    const MatchTally& tally) {
    out << spec.id << " — " << spec.name << " (" << toString(spec.kind()) << ", "
        << toString(spec.better) << " is better)\n";
    if (!spec.question.empty()) out << "  " << spec.question << "\n";
    constexpr std::size_t label = 16, cell = 13;
    out << "  " << pad("", label) << "our goal → their goal\n";
    out << "  " << pad("", label);
    for (int b = 1; b <= grid.bands(); ++b) out << pad("band " + std::to_string(b), cell);
    out << "\n";
    ZoneTally total;
    for (int lane = grid.lanes(); lane >= 1; --lane) {
        static const char* const markedLanes[] = {"right wing", "right half-sp.", "centre",
                                                   "left half-sp.", "left wing"};
        std::string name = "lane " + std::to_string(lane);
        if (grid.kind() == ZoneGrid::Kind::Markings) name = markedLanes[lane - 1];
        else if (lane == grid.lanes()) name += " (left)";
        else if (lane == 1) name += " (right)";
        out << "  " << pad(name, label);
        for (int band = 1; band <= grid.bands(); ++band) {
            const ZoneTally& z = tally[static_cast<std::size_t>(grid.indexOf({band, lane}))];
            out << pad(cellText(spec, z), cell);
            total.num += z.num;
            total.den += z.den;
        }
        out << "\n";
    }
    if (spec.kind() == MetricKind::Count) total.den = 1;
    out << "  " << pad("whole pitch", label) << cellText(spec, total) << "\n\n";
}

std::string scoreLine(const MatchSummary& m) {
    if (!m.goalsUs || !m.goalsOpp) return "";
    const char* outcome = *m.goalsUs > *m.goalsOpp ? "W" : *m.goalsUs < *m.goalsOpp ? "L" : "D";
    return std::to_string(*m.goalsUs) + "–" + std::to_string(*m.goalsOpp) + " " + outcome;
}

} // namespace pitchloop::cli
