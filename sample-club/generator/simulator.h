#pragma once

#include "season.h"

#include <array>
#include <cstdint>
#include <string>
#include <vector>

namespace pitchloop::demo {

enum class Side { Us = 0, Opp = 1 };

enum class EventType {
    Pass,
    Carry,
    TakeOn,
    Shot,
    Recovery,
    Interception,
    Tackle,
    Keeper,
    Clearance,
    Block,
    Foul,
    Out,
};

enum class Outcome { None, Ok, Fail, Goal, Saved, Blocked, Off, Post };

// Bit flags for the optional "tags" list of an event.
enum class Tag : std::uint32_t {
    Cross = 1u << 0,
    Cutback = 1u << 1,
    ThroughBall = 1u << 2,
    LongBall = 1u << 3,
    Header = 1u << 4,
    SetPiece = 1u << 5,
    ThrowIn = 1u << 6,
    Corner = 1u << 7,
    FreeKick = 1u << 8,
    GoalKick = 1u << 9,
    KickOff = 1u << 10,
};

constexpr std::uint32_t operator|(Tag a, Tag b) {
    return static_cast<std::uint32_t>(a) | static_cast<std::uint32_t>(b);
}
constexpr std::uint32_t operator|(std::uint32_t a, Tag b) {
    return a | static_cast<std::uint32_t>(b);
}
constexpr bool hasTag(std::uint32_t tags, Tag t) {
    return (tags & static_cast<std::uint32_t>(t)) != 0;
}

// One on-ball action, coordinates in the acting side's attacking direction (metres, unrounded).
struct MatchEvent {
    int period = 1;
    int tenths = 0; // time since the start of the period in 0.1 s
    Side side = Side::Us;
    int shirt = 0;
    EventType type = EventType::Pass;
    Outcome outcome = Outcome::None;
    double x = 0.0;
    double y = 0.0;
    bool hasEnd = false;
    double toX = 0.0;
    double toY = 0.0;
    std::uint32_t tags = 0;
    std::string clip; // optional extra field, written only when non-empty
};

// Everything needed to write one match file.
struct MatchRecord {
    Fixture fixture;
    std::string opponentName;
    int pitchLength = 105;
    int pitchWidth = 68;
    std::array<int, 2> score{};          // indexed by Side
    std::array<int, 2> periodSeconds{};  // length of each period incl. added time
    std::array<bool, 2> usAttackPlusX{}; // ground frame only: our direction per period
    std::vector<MatchEvent> events;
};

// Plays one fixture of the season; the seed fully determines the result.
MatchRecord simulateMatch(const Season& season, const Fixture& fixture, std::uint64_t seed);

} // namespace pitchloop::demo
