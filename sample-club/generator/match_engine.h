#pragma once

#include "rng.h"
#include "season.h"
#include "simulator.h"

#include <array>
#include <cstdint>
#include <vector>

namespace pitchloop::demo::detail {

constexpr int kUs = 0;
constexpr int kOpp = 1;
constexpr int kKeeperSlot = 0;
constexpr int kStrikerSlot = 10;
constexpr int kPressWindowTenths = 50;

constexpr double kBoxDepth = 16.5;
constexpr double kBoxHalfWidth = 20.16;
constexpr double kGoalWidth = 7.32;

constexpr int other(int side) {
    return 1 - side;
}

// A spot on the pitch in metres, in some side's attacking direction.
struct Point {
    double x = 0.0;
    double y = 0.0;
};

// The dead-ball restart the next step has to take.
enum class Restart { None, KickOff, ThrowIn, GoalKick, Corner, FreeKick, KeeperHold };

// How the ball changed hands; after dead balls the losing side rarely wins it straight back.
enum class GainContext { OpenPlay, ThrowIn, FreeKick, Corner, GoalKick, KickOff, KeeperHold };

// What a pass is meant to be; decides receiver choice, length, success and tags.
enum class PassKind { Normal, Safe, Quick, Long, Through, Cross, Cutback };

// The losing side's counter-press after a turnover, decided when the turnover happens so the
// "won back within 5 s" rate follows the team's pressing profile.
struct PressState {
    bool active = false;
    bool wins = false;
    int pressing = 0;
    int deadline = 0;
    int quickActions = 0;
};

// A planned second-half change.
struct Substitution {
    int side = 0;
    int slot = 0;
    int shirt = 0;
    int atTenths = 0;
    bool done = false;
};

// Possession-chain simulation of one match: the side on the ball acts until it loses it, shoots,
// or the ball goes dead; every action is one event in the acting side's direction.
class MatchEngine {
  public:
    MatchEngine(const Season& season, const Fixture& fixture, std::uint64_t seed);
    MatchRecord run();

  private:
    // simulator.cpp: clock, bookkeeping, geometry, squads
    void pickLineups();
    void planSubstitutions();
    void applyDueSubstitutions();
    void playPeriod(int period, int kickOffSide);
    void step();
    void advance(double seconds);
    void emit(MatchEvent ev, GainContext ctx = GainContext::OpenPlay);
    void preparePress(int gainingSide, GainContext ctx);
    MatchEvent makeEvent(int side, int slot, EventType type, Outcome outcome, Point at) const;
    void give(int side, int slot, Point at);
    void setRestart(Restart kind, int side, Point at, double delaySeconds);

    Point flip(Point p) const { return {m_len - p.x, m_wid - p.y}; }
    Point clampToPitch(Point p, double margin = 0.3) const;
    Point slotPosition(int side, int slot, Point ball, bool inPossession) const;
    int nearestPlayer(int side, Point at, bool inPossession, bool allowKeeper,
                      int exclude = -1) const;
    int pickDefender(int side, Point at);
    const Slot& slotOf(int side, int slot) const;
    const TeamStyle& style(int side) const {
        return m_teams[static_cast<std::size_t>(side)]->style;
    }
    int shirt(int side, int slot) const;
    double exposure(int side) const { return side == kOpp ? m_fixture.leftFlankExposure : 0.0; }
    bool inBox(Point p) const;
    bool inOverloadZone(Point p) const;
    int third(double x) const;
    double goalAngle(Point p) const;

    // engine_open_play.cpp: decisions of the side on the ball
    void openPlay();
    void escapePress();
    void quickAction();
    void counterPressWins();
    void playPass(PassKind kind, std::uint32_t tags = 0, double successOverride = -1.0);
    int pickReceiver(PassKind kind, Point& dest);
    double passSuccess(Point from, Point to, PassKind kind) const;
    void passFailed(Point from, Point to, PassKind kind, double travel);
    void crossDefended(Point to);
    void playCarry(bool forceOk);
    void playTakeOn();
    double shotChance(Point p) const;

    // engine_set_pieces.cpp: shots, stoppages and restarts
    void restart();
    void takeKickOff();
    void takeThrowIn();
    void takeGoalKick();
    void takeCorner();
    void takeFreeKick();
    void keeperDistribution(GainContext ctx);
    void takeShot(std::uint32_t tags, bool hurried = false);
    void shotSaved(Point shotAt, bool hurried);
    void shotBlocked(Point shotAt, bool hurried);
    void looseBall(int favouredSide, Point at, double favouredShare);
    void ballOut(int lastTouch, int slot, Point crossing);
    void clearance();
    void defensiveFoul();
    void attackingFoul();

    const Fixture& m_fixture;
    std::array<const Team*, 2> m_teams{};
    Rng m_rng;
    double m_len = 105.0;
    double m_wid = 68.0;
    std::array<double, 2> m_homeEdge{};

    std::array<std::array<int, 11>, 2> m_onPitch{};
    std::array<std::vector<BenchPlayer>, 2> m_bench;
    std::vector<Substitution> m_subs;

    std::vector<MatchEvent> m_events;
    std::array<int, 2> m_score{};
    int m_period = 1;
    int m_clock = 0;
    int m_periodEnd = 0;
    bool m_whistle = false;

    int m_control = -1;
    int m_side = kUs;
    int m_holder = kStrikerSlot;
    Point m_ball;
    Restart m_restart = Restart::None;
    GainContext m_pendingContext = GainContext::OpenPlay;
    bool m_pressPrepared = false;
    int m_hardDeadline = 0; // while > 0 the clock may not pass it (a counter-press that must land)
    PressState m_press;
    std::array<Point, 2> m_lastTouch{};
    int m_overloadPassAt = -1000; // clock of the last completed pass out of the overload zone
};

} // namespace pitchloop::demo::detail
