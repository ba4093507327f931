#pragma once

#include "simulator.h"

#include <string>

namespace pitchloop::demo {

// Headline numbers of one simulated match, for the generator's log line.
struct MatchSummary {
    int events = 0;
    std::array<int, 2> passes{};
    std::array<int, 2> passesOk{};
    std::array<int, 2> shots{};
};

// Renders a match file (format "pitchloop-match", version 1): pretty header, one event per line,
// coordinates converted to the fixture's frame and rounded to 0.1 m.
std::string renderMatchFile(const MatchRecord& record, const std::string& clubName);

MatchSummary summarize(const MatchRecord& record);

} // namespace pitchloop::demo
