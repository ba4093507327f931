#include "sheetformat.h"

#include "drills.h"

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

std::string valueText(MetricKind kind, double value) {
    if (std::isnan(value)) return "–";
    char buf[32];
    if (kind == MetricKind::Rate)
        std::snprintf(buf, sizeof buf, "%.1f %%", 100 * value);
    else
        std::snprintf(buf, sizeof buf, "%.2f", value);
    return buf;
}

std::string unitText(MetricKind kind) {
    return kind == MetricKind::Count ? " a match" : "";
}

std::string targetText(Direction direction, MetricKind kind, double value) {
    return std::string(direction == Direction::AtLeast ? "≥ " : "≤ ") + valueText(kind, value);
}

std::string probabilityText(double p) {
    if (std::isnan(p)) return "–";
    if (p >= 0.9995) return "> 0.999";
    if (p < 0.0005) return "< 0.001";
    char buf[16];
    std::snprintf(buf, sizeof buf, "%.3f", p);
    return buf;
}

std::string zoneText(int band, int lane) {
    if (band == 0 && lane == 0) return "whole pitch";
    return "band " + std::to_string(band) + ", lane " + std::to_string(lane);
}

std::string windowText(const Window& window) {
    switch (window.kind) {
    case Window::Kind::Match:
        return "this match alone";
    case Window::Kind::LastN:
        return window.n == 1 ? "the last match"
                             : "the last " + std::to_string(window.n) + " matches";
    case Window::Kind::Season:
        return "the season so far";
    case Window::Kind::Ewma:
        return "the EWMA (λ " + shortNumber(window.lambda, 2) + ")";
    }
    return window.name();
}

std::string stateText(FlagState state) {
    switch (state) {
    case FlagState::OnTarget:
        return "on target";
    case FlagState::CloseToLine:
        return "close to the line";
    case FlagState::LikelyOff:
        return "likely off, not yet certain";
    case FlagState::OffTarget:
        return "off target";
    case FlagState::TooLittleData:
        return "too little data";
    case FlagState::NoTarget:
        return "no target";
    }
    return "";
}

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
