#include "sheetformat.h"

#include "drills.h"
#include "wording.h"
#include "zonenames.h"

#include <array>
#include <cmath>
#include <cstdio>

namespace pitchloop::print {

using namespace pitchloop::model;

std::string longDate(const std::string& isoDate, long dayNumber) {
    static constexpr std::array<const char*, 7> kDays{"Thursday", "Friday",  "Saturday", "Sunday",
                                                      "Monday",   "Tuesday", "Wednesday"};
    static constexpr std::array<const char*, 12> kMonths{
        "January", "February", "March",     "April",   "May",      "June",
        "July",    "August",   "September", "October", "November", "December"};
    int y = 0, m = 0, d = 0;
    if (std::sscanf(isoDate.c_str(), "%d-%d-%d", &y, &m, &d) != 3 || m < 1 || m > 12)
        return isoDate;
    const long weekday = ((dayNumber % 7) + 7) % 7; // 1970-01-01 was a Thursday
    return std::string(kDays[static_cast<std::size_t>(weekday)]) + " " + std::to_string(d) + " " +
           kMonths[static_cast<std::size_t>(m - 1)] + " " + std::to_string(y);
}

std::string roleText(BlockRole role) {
    switch (role) {
    case BlockRole::WarmUp:
        return "Warm-up";
    case BlockRole::Main:
        return "Main";
    case BlockRole::CoolDown:
        return "Cool-down";
    }
    return "";
}

std::string valueText(MetricKind kind, double value) { return words::value(kind, value); }

std::string unitText(MetricKind kind) {
    return kind == MetricKind::Count ? " a match" : "";
}

std::string targetText(Direction direction, MetricKind kind, double value) {
    return words::target(direction, kind, value);
}

std::string probabilityText(double p) { return words::probability(p); }

std::string zoneText(int band, int lane, const ZoneGrid& grid) { return zoneLabel(band, lane, grid); }

std::string windowText(const Window& window) { return words::windowName(window); }

std::string stateText(FlagState state) { return words::stateName(state); }

std::string scoreText(const std::optional<int>& us, const std::optional<int>& them) {
    if (!us || !them) return "";
    const char* outcome = *us > *them ? "W" : *us < *them ? "L" : "D";
    return std::to_string(*us) + "–" + std::to_string(*them) + " " + outcome;
}

std::string gridText(const ZoneGrid& grid) {
    std::string text =
        std::to_string(grid.bands()) + " bands × " + std::to_string(grid.lanes()) + " lanes";
    if (grid.kind() == ZoneGrid::Kind::Markings) text += " cut at the box lines";
    return text;
}

std::string shortNumber(double v, int decimals) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    std::string s = buf;
    if (s.find('.') != std::string::npos) {
        s.erase(s.find_last_not_of('0') + 1);
        if (s.back() == '.') s.pop_back();
    }
    return s;
}

} // namespace pitchloop::print
