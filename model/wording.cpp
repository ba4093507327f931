#include "wording.h"

#include "zonenames.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace pitchloop::model::words {

namespace {

std::string fixed(double v, int decimals) {
    char buf[48];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    return buf;
}

void replaceAll(std::string& text, const std::string& from, const std::string& to) {
    for (std::size_t at = text.find(from); at != std::string::npos; at = text.find(from, at + to.size()))
        text.replace(at, from.size(), to);
}

} // namespace

namespace {

/// {window} in a sentence: "in this match", "over the last 5 matches".
std::string sentenceWindow(const Window& w) {
    return (w.kind == Window::Kind::Match ? "in " : "over ") + windowName(w);
}

} // namespace

std::string stateName(FlagState state) {
    switch (state) {
    case FlagState::OnTarget: return "on target";
    case FlagState::CloseToLine: return "close to the line";
    case FlagState::LikelyOff: return "likely off";
    case FlagState::OffTarget: return "off target";
    case FlagState::TooLittleData: return "too little data";
    case FlagState::NoTarget: return "no target";
    }
    return "";
}

std::string backOnTarget() { return "back on target"; }

std::string windowName(const Window& window) {
    switch (window.kind) {
    case Window::Kind::Match: return "this match";
    case Window::Kind::LastN:
        return window.n == 1 ? "the last match" : "the last " + std::to_string(window.n) + " matches";
    case Window::Kind::Season: return "the season so far";
    case Window::Kind::Ewma: return "recent matches, weighted (λ " + fixed(window.lambda, 2) + ")";
    }
    return window.name();
}

std::string windowTitle(const Window& window) {
    std::string name = windowName(window);
    if (name.rfind("the ", 0) == 0) name.erase(0, 4);
    return capitalised(name);
}

std::string capitalised(std::string text) {
    if (!text.empty() && text[0] >= 'a' && text[0] <= 'z') text[0] = static_cast<char>(text[0] - 'a' + 'A');
    return text;
}

std::string itemsWord(const MetricSpec& metric) {
    if (metric.items.losses) return "losses";
    const auto& types = metric.items.select.types;
    if (types.size() == 1) {
        switch (types.front()) {
        case EventType::Pass: return "passes";
        case EventType::Shot: return "shots";
        case EventType::Carry: return "carries";
        case EventType::Tackle: return "tackles";
        case EventType::Interception: return "interceptions";
        case EventType::Recovery: return "recoveries";
        default: break;
        }
    }
    const bool defensive = !types.empty() && std::all_of(types.begin(), types.end(), [](EventType t) {
        return t == EventType::Tackle || t == EventType::Interception || t == EventType::Foul ||
               t == EventType::Block;
    });
    return defensive ? "defensive actions" : "events";
}

std::string rate(double share) {
    if (std::isnan(share)) return "–";
    return fixed(100 * share, 1) + "%";
}

std::string count(double v) {
    if (std::isnan(v)) return "–";
    return fixed(v, std::abs(v - std::round(v)) < 0.005 ? 0 : 1);
}

std::string grouped(double v) {
    if (std::isnan(v)) return "–";
    const std::string digits = fixed(std::abs(std::round(v)), 0);
    std::string out = v <= -0.5 ? "-" : "";
    for (std::size_t i = 0; i < digits.size(); ++i) {
        if (i > 0 && (digits.size() - i) % 3 == 0) out += ',';
        out += digits[i];
    }
    return out;
}

std::string value(MetricKind kind, double v) {
    switch (kind) {
    case MetricKind::Rate: return rate(v);
    case MetricKind::Count: return count(v);
    case MetricKind::Exposure: return std::isnan(v) ? "–" : fixed(v, 2);
    }
    return "";
}

std::string interval(MetricKind kind, const stats::Interval& i) {
    if (std::isnan(i.low) || std::isnan(i.high) || std::isinf(i.high)) return "–";
    if (kind == MetricKind::Rate) return fixed(100 * i.low, 1) + "–" + fixed(100 * i.high, 1) + "%";
    const int decimals = kind == MetricKind::Count ? 1 : 2;
    return fixed(i.low, decimals) + "–" + fixed(i.high, decimals);
}

std::string probability(double p) {
    if (std::isnan(p)) return "–";
    if (p >= 0.9995) return "> 0.999";
    if (p < 0.0005) return "< 0.001";
    if (p >= 0.995 || p < 0.005) return fixed(p, 3);
    return fixed(p, 2);
}

std::string pValue(double p) {
    if (std::isnan(p)) return "–";
    if (p < 0.0001) return "< 0.0001";
    if (p >= 0.995) return "1.0";
    // Two significant figures: the exponent of the leading digit sets the decimals.
    const int decimals = std::max(2, 1 - static_cast<int>(std::floor(std::log10(p))));
    return fixed(p, decimals);
}

std::string target(Direction direction, MetricKind kind, double v) {
    return std::string(direction == Direction::AtLeast ? "≥ " : "≤ ") + value(kind, v);
}

std::string targetInWords(Direction direction, MetricKind kind, double v) {
    return std::string(direction == Direction::AtLeast ? "at least " : "at most ") + value(kind, v);
}

std::string howSure(FlagState state) {
    switch (state) {
    case FlagState::OffTarget: return "This is very unlikely to be bad luck.";
    case FlagState::LikelyOff:
        return "Probably a real slip, but bad luck could still explain it; the next matches will tell.";
    case FlagState::CloseToLine: return "On the right side of the target, but only just.";
    case FlagState::OnTarget: return "Comfortably on the right side of the target.";
    case FlagState::TooLittleData: return "Too few moments here yet to tell a slip from bad luck.";
    case FlagState::NoTarget: return "";
    }
    return "";
}

std::string coachSentence(const MetricSpec& metric, const ZoneStatus& status, const ZoneGrid& grid) {
    const MetricKind kind = metric.kind();
    const std::string zone =
        zonePhrase(status.band, status.lane, grid);
    std::string text;
    if (!metric.sentence.empty()) {
        text = metric.sentence;
        replaceAll(text, "{zone}", zone);
        replaceAll(text, "{value}", value(kind, status.value));
        replaceAll(text, "{window}", sentenceWindow(status.window));
        if (status.window.kind == Window::Kind::Match) replaceAll(text, " a match in this match", " in this match");
    } else {
        text = metric.name + " in " + zone + ": " + value(kind, status.value) +
               (kind == MetricKind::Count ? " a match " : " ") + sentenceWindow(status.window);
    }
    text = capitalised(text);
    if (status.target)
        text += "; we aim for " + targetInWords(status.target->direction, kind, status.target->value) + ".";
    else
        text += ".";
    if (const std::string sure = howSure(status.state); !sure.empty()) text += " " + sure;
    return text;
}

std::string unusualMatchSentence(const MetricSpec& metric, const ZoneStatus& status, const ZoneGrid& grid) {
    ZoneStatus said = status;
    said.state = FlagState::NoTarget; // no claim about luck from one match
    std::string text = coachSentence(metric, said, grid);
    if (std::isnan(status.matchTail)) return text;
    return text + " One match cannot judge that target, but a team on its target has a match like this only about 1 in " +
           grouped(1 / std::max(status.matchTail, 1e-12)) + ".";
}

std::string analystLine(const ZoneStatus& status, MetricKind kind) {
    std::string line = value(kind, status.value);
    if (status.level > 0)
        line += " (" + fixed(100 * status.level, 0) + "% interval " + interval(kind, status.interval) + ")";
    const bool ewma = status.window.kind == Window::Kind::Ewma;
    if (kind == MetricKind::Count)
        line += " · " + std::to_string(status.sum.matches) + (status.sum.matches == 1 ? " match" : " matches");
    else
        line += std::string(" · n ") + (ewma ? "≈ " : "= ") + fixed(status.sum.den, 0);
    if (status.target) {
        line += " · target " + target(status.target->direction, kind, status.target->value);
        if (status.state != FlagState::TooLittleData) line += " · P(miss) " + probability(status.pMiss);
    }
    line += " · " + stateName(status.state);
    return line;
}

} // namespace pitchloop::model::words
