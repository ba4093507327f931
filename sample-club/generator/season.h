#pragma once

#include <array>
#include <cstdint>
#include <string>
#include <vector>

namespace pitchloop::demo {

enum class Role {
    Goalkeeper,
    RightBack,
    RightCentreBack,
    CentreBack,
    LeftCentreBack,
    LeftBack,
    RightWingBack,
    LeftWingBack,
    DefensiveMid,
    RightCentreMid,
    LeftCentreMid,
    AttackingMid,
    RightMid,
    LeftMid,
    RightWing,
    LeftWing,
    Striker,
};

// A position in a formation: home spot as pitch fractions in the team's own attacking direction
// (x from own goal line, y from own right touchline).
struct Slot {
    Role role;
    double fx;
    double fy;
};

// Eleven slots; slot 0 is always the goalkeeper.
struct Formation {
    const char* name;
    std::array<Slot, 11> slots;
};

// A substitute and the slot he normally covers.
struct BenchPlayer {
    int shirt;
    int slot;
};

// Shirt numbers of a team: first choice per formation slot plus the bench.
struct Squad {
    std::array<int, 11> starters{};
    std::vector<BenchPlayer> bench;
};

// Playing style knobs the match engine reads; all are multipliers or additive probabilities.
struct TeamStyle {
    double passSkill = 0.0;   // added to every pass completion probability
    double pressHigh = 0.0;   // chance the counter-press wins the ball back within 5 s,
    double pressMid = 0.0;    // by the third of the pitch where the ball was lost
    double pressDeep = 0.0;   // (third measured in the losing team's direction)
    double attack = 1.0;      // multiplier on shot attempts
    double finishing = 1.0;   // multiplier on goal probability
    double keeping = 1.0;     // divides the opponent's goal probability
    double directness = 0.05; // share of long balls from deep
    double foulRate = 1.0;    // multiplier on defensive fouls
};

// A club as the generator knows it.
struct Team {
    std::string name;
    int pitchLength = 105;
    int pitchWidth = 68;
    const Formation* formation = nullptr;
    Squad squad;
    TeamStyle style;
};

enum class Frame { Acting, Us, Ground };

// One league fixture from Kestrel Bay's point of view.
struct Fixture {
    int number = 0;   // 1..34
    std::string id;   // KB-2026-NN
    std::string date; // YYYY-MM-DD
    bool home = true;
    int opponent = 0; // index into Season::opponents
    Frame frame = Frame::Acting;
    double leftFlankExposure = 0.0; // 1 = our left-back zone is wide open (the planted story)
};

// The demo club, its league opponents and its 34 fixtures.
struct Season {
    Team club;
    std::vector<Team> opponents;
    std::vector<Fixture> fixtures;
};

constexpr int kSeasonMatches = 34;

Season buildSeason(std::uint64_t seed);

bool isRightFlank(Role role);
bool isForward(Role role);

} // namespace pitchloop::demo
