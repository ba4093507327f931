#include "simulator.h"

#include "match_engine.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace pitchloop::demo {
namespace detail {
namespace {

bool isControlGiving(EventType type, Outcome outcome) {
    switch (type) {
    case EventType::Pass:
    case EventType::Carry:
    case EventType::TakeOn:
    case EventType::Shot:
    case EventType::Recovery:
        return true;
    case EventType::Interception:
    case EventType::Tackle:
    case EventType::Keeper:
        return outcome == Outcome::Ok;
    default:
        return false;
    }
}

std::string matchClock(int period, int tenths) {
    const int total = (period - 1) * 2700 + tenths / 10;
    char buf[16];
    std::snprintf(buf, sizeof buf, "%02d:%02d:%02d", total / 3600, (total / 60) % 60, total % 60);
    return buf;
}

} // namespace

MatchEngine::MatchEngine(const Season& season, const Fixture& fixture, std::uint64_t seed)
    : m_fixture(fixture), m_rng(seed) {
    m_teams[kUs] = &season.club;
    m_teams[kOpp] = &season.opponents[static_cast<std::size_t>(fixture.opponent)];
    const Team& ground = fixture.home ? season.club : *m_teams[kOpp];
    m_len = ground.pitchLength;
    m_wid = ground.pitchWidth;
    m_homeEdge[kUs] = fixture.home ? 0.012 : 0.0;
    m_homeEdge[kOpp] = fixture.home ? 0.0 : 0.012;
    pickLineups();
    planSubstitutions();
}

void MatchEngine::pickLineups() {
    for (int side : {kUs, kOpp}) {
        const auto s = static_cast<std::size_t>(side);
        m_onPitch[s] = m_teams[s]->squad.starters;
        m_bench[s] = m_teams[s]->squad.bench;
        // Occasional rotation: a substitute starts and the regular drops to the bench.
        const double rotation = side == kUs ? 0.04 : 0.08;
        for (auto& sub : m_bench[s]) {
            if (sub.slot != kKeeperSlot && m_rng.chance(rotation)) {
                std::swap(sub.shirt, m_onPitch[s][static_cast<std::size_t>(sub.slot)]);
            }
        }
    }
}

void MatchEngine::planSubstitutions() {
    for (int side : {kUs, kOpp}) {
        std::vector<BenchPlayer> outfield;
        for (const auto& b : m_bench[static_cast<std::size_t>(side)]) {
            if (b.slot != kKeeperSlot) {
                outfield.push_back(b);
            }
        }
        m_rng.shuffle(std::span<BenchPlayer>(outfield));
        int wanted = 2 + (m_rng.chance(0.6) ? 1 : 0) + (m_rng.chance(0.3) ? 1 : 0);
        std::vector<int> usedSlots;
        for (const auto& b : outfield) {
            if (wanted == 0) {
                break;
            }
            if (std::find(usedSlots.begin(), usedSlots.end(), b.slot) != usedSlots.end()) {
                continue;
            }
            usedSlots.push_back(b.slot);
            m_subs.push_back({side, b.slot, b.shirt, m_rng.uniformInt(5400, 25800), false});
            --wanted;
        }
    }
    std::sort(m_subs.begin(), m_subs.end(),
              [](const Substitution& l, const Substitution& r) { return l.atTenths < r.atTenths; });
}

void MatchEngine::applyDueSubstitutions() {
    if (m_period != 2) {
        return;
    }
    bool any = false;
    for (auto& sub : m_subs) {
        if (!sub.done && m_clock >= sub.atTenths) {
            m_onPitch[static_cast<std::size_t>(sub.side)][static_cast<std::size_t>(sub.slot)] =
                sub.shirt;
            sub.done = true;
            any = true;
        }
    }
    if (any) {
        advance(m_rng.uniform(15.0, 30.0));
    }
}

MatchRecord MatchEngine::run() {
    MatchRecord record;
    record.fixture = m_fixture;
    record.opponentName = m_teams[kOpp]->name;
    record.pitchLength = static_cast<int>(m_len);
    record.pitchWidth = static_cast<int>(m_wid);
    const bool firstPlus = m_rng.chance(0.5);
    record.usAttackPlusX = {firstPlus, !firstPlus};

    const int firstKickOff = m_rng.chance(0.5) ? kUs : kOpp;
    const std::array<int, 2> lengths{2700 + m_rng.uniformInt(60, 250),
                                     2700 + m_rng.uniformInt(150, 400)};
    for (int period = 1; period <= 2; ++period) {
        m_periodEnd = lengths[static_cast<std::size_t>(period - 1)] * 10;
        playPeriod(period, period == 1 ? firstKickOff : other(firstKickOff));
    }
    record.periodSeconds = lengths;
    record.score = m_score;
    record.events = std::move(m_events);
    return record;
}

void MatchEngine::playPeriod(int period, int kickOffSide) {
    m_period = period;
    m_clock = 0;
    m_whistle = false;
    m_control = -1;
    m_press = {};
    m_pressPrepared = false;
    m_hardDeadline = 0;
    m_overloadPassAt = -1000;
    setRestart(Restart::KickOff, kickOffSide, {m_len / 2.0, m_wid / 2.0}, 0.0);
    while (!m_whistle && m_clock <= m_periodEnd) {
        step();
    }
}

void MatchEngine::step() {
    if (m_restart != Restart::None) {
        restart();
    } else {
        openPlay();
    }
}

void MatchEngine::advance(double seconds) {
    m_clock += std::max(0, static_cast<int>(seconds * 10.0 + 0.5));
    if (m_hardDeadline > 0) {
        m_clock = std::min(m_clock, m_hardDeadline);
    }
}

void MatchEngine::preparePress(int gainingSide, GainContext ctx) {
    m_pressPrepared = true;
    if (m_control < 0 || m_control == gainingSide) {
        return;
    }
    const int loser = m_control;
    const TeamStyle& st = style(loser);
    const double lostAt = m_lastTouch[static_cast<std::size_t>(loser)].x;
    double p = st.pressDeep;
    if (third(lostAt) == 1) {
        p = st.pressMid;
    } else if (third(lostAt) == 2) {
        p = st.pressHigh;
    }
    switch (ctx) {
    case GainContext::OpenPlay:
        break;
    case GainContext::ThrowIn:
        p *= 0.6;
        break;
    case GainContext::FreeKick:
        p *= 0.15;
        break;
    case GainContext::Corner:
        p *= 0.2;
        break;
    case GainContext::GoalKick:
        p *= 0.1;
        break;
    case GainContext::KickOff:
    case GainContext::KeeperHold:
        p *= 0.05;
        break;
    }
    m_press = {};
    m_press.active = true;
    m_press.pressing = loser;
    m_press.deadline = m_clock + kPressWindowTenths;
    m_press.wins = m_rng.chance(p);
    if (m_press.wins) {
        const std::array<double, 3> quick{0.45, 0.4, 0.15};
        m_press.quickActions = static_cast<int>(m_rng.weighted(quick));
    }
}

void MatchEngine::emit(MatchEvent ev, GainContext ctx) {
    if (m_clock > m_periodEnd) {
        m_whistle = true;
        return;
    }
    ev.period = m_period;
    ev.tenths = m_clock;
    const int side = static_cast<int>(ev.side);
    // Once the winning counter-press has landed, later events are no longer held to its window.
    if (m_hardDeadline > 0 && m_press.active && m_press.wins) {
        const bool regain =
            (side == m_press.pressing && isControlGiving(ev.type, ev.outcome)) ||
            (side != m_press.pressing && (ev.type == EventType::Foul || ev.type == EventType::Out));
        if (regain) {
            m_hardDeadline = 0;
        }
    }
    if (isControlGiving(ev.type, ev.outcome) && side != m_control) {
        if (!m_pressPrepared) {
            preparePress(side, ctx);
        }
        m_control = side;
    }
    m_pressPrepared = false;
    m_lastTouch[static_cast<std::size_t>(side)] = {ev.x, ev.y};
    if (ev.type == EventType::Shot && ev.outcome == Outcome::Goal) {
        ++m_score[static_cast<std::size_t>(side)];
    }
    // Two files carry an extra per-event field on shots on target; readers should ignore it.
    if (ev.type == EventType::Shot &&
        (ev.outcome == Outcome::Goal || ev.outcome == Outcome::Saved) &&
        (m_fixture.number == 3 || m_fixture.number == 20)) {
        ev.clip = matchClock(m_period, m_clock);
    }
    m_events.push_back(std::move(ev));
}

MatchEvent MatchEngine::makeEvent(int side, int slot, EventType type, Outcome outcome,
                                  Point at) const {
    MatchEvent ev;
    ev.side = static_cast<Side>(side);
    ev.shirt = shirt(side, slot);
    ev.type = type;
    ev.outcome = outcome;
    const Point p = clampToPitch(at, 0.0);
    ev.x = p.x;
    ev.y = p.y;
    return ev;
}

void MatchEngine::give(int side, int slot, Point at) {
    m_side = side;
    m_holder = slot;
    m_ball = clampToPitch(at);
}

void MatchEngine::setRestart(Restart kind, int side, Point at, double delaySeconds) {
    m_restart = kind;
    m_side = side;
    m_ball = clampToPitch(at, 0.0);
    advance(delaySeconds);
}

Point MatchEngine::clampToPitch(Point p, double margin) const {
    return {std::clamp(p.x, margin, m_len - margin), std::clamp(p.y, margin, m_wid - margin)};
}

const Slot& MatchEngine::slotOf(int side, int slot) const {
    return m_teams[static_cast<std::size_t>(side)]
        ->formation->slots[static_cast<std::size_t>(slot)];
}

int MatchEngine::shirt(int side, int slot) const {
    return m_onPitch[static_cast<std::size_t>(side)][static_cast<std::size_t>(slot)];
}

// Where a player stands given the ball: the block slides up the pitch with the ball and shifts
// towards its side; a team out of possession sits deeper and more compact.
Point MatchEngine::slotPosition(int side, int slot, Point ball, bool inPossession) const {
    const Slot& s = slotOf(side, slot);
    const double midY = m_wid / 2.0;
    if (s.role == Role::Goalkeeper) {
        const double x = inPossession ? std::clamp(ball.x * 0.12, 3.0, 14.0)
                                      : std::clamp(2.0 + ball.x * 0.04, 2.0, 6.0);
        return {x, midY + (ball.y - midY) * 0.1};
    }
    double fx = s.fx;
    // Story: while our left side leaks, the opposition's right flank pushes on in possession.
    if (inPossession && isRightFlank(s.role)) {
        fx += 0.10 * exposure(side);
    }
    double x = 0.0;
    double y = 0.0;
    if (inPossession) {
        x = (0.72 * fx - 0.13) * m_len + 0.55 * ball.x;
        // Forwards stop around the penalty spot rather than running onto the goal line.
        const double cap = m_len - 9.0;
        if (x > cap) {
            x = cap + (x - cap) * 0.3;
        }
        y = midY + (s.fy - 0.5) * m_wid * 0.95 + (ball.y - midY) * 0.2;
    } else {
        // Back line holds a line ahead of the box; forwards stay higher as outlets or pressers.
        x = (0.3 * fx - 0.035) * m_len + (0.4 + 0.4 * fx) * ball.x;
        y = midY + (s.fy - 0.5) * m_wid * 0.7 + (ball.y - midY) * 0.35;
    }
    return clampToPitch({x, y}, 1.0);
}

int MatchEngine::nearestPlayer(int side, Point at, bool inPossession, bool allowKeeper,
                               int exclude) const {
    int best = 1;
    double bestD = 1e18;
    for (int j = allowKeeper ? 0 : 1; j < 11; ++j) {
        if (j == exclude) {
            continue;
        }
        const Point p = slotPosition(side, j, at, inPossession);
        const double d = (p.x - at.x) * (p.x - at.x) + (p.y - at.y) * (p.y - at.y);
        if (d < bestD) {
            bestD = d;
            best = j;
        }
    }
    return best;
}

// The defender who makes a defensive action at `at` (defending side's own frame).
int MatchEngine::pickDefender(int side, Point at) {
    std::array<double, 11> w{};
    for (int j = 1; j < 11; ++j) {
        const Point p = slotPosition(side, j, at, false);
        const double d2 = ((p.x - at.x) * (p.x - at.x) + (p.y - at.y) * (p.y - at.y)) / 36.0;
        // Forwards harry, but the ball is usually won by the midfield and the back line.
        const double role = isForward(slotOf(side, j).role) ? 0.5 : 1.0;
        w[static_cast<std::size_t>(j)] = role / ((1.0 + d2) * (1.0 + d2));
    }
    return static_cast<int>(m_rng.weighted(w));
}

bool MatchEngine::inBox(Point p) const {
    return p.x >= m_len - kBoxDepth && std::abs(p.y - m_wid / 2.0) <= kBoxHalfWidth;
}

// Opposition frame: their attacking band 5 on their right = our band 2, lane 5 (our left).
bool MatchEngine::inOverloadZone(Point p) const {
    return p.x > m_len * 4.0 / 6.0 && p.x <= m_len * 5.0 / 6.0 && p.y <= m_wid / 5.0;
}

int MatchEngine::third(double x) const {
    if (x < m_len / 3.0) {
        return 0;
    }
    return x < m_len * 2.0 / 3.0 ? 1 : 2;
}

// Angle subtended by the goal mouth, via a rational approximation of atan.
double MatchEngine::goalAngle(Point p) const {
    const double dx = std::max(0.3, m_len - p.x);
    const double dy = std::abs(p.y - m_wid / 2.0);
    return kGoalWidth * dx / (dx * dx + dy * dy + 1.0);
}

} // namespace detail

MatchRecord simulateMatch(const Season& season, const Fixture& fixture, std::uint64_t seed) {
    std::uint64_t sm = seed ^ (0xA24BAED4963EE407ull * static_cast<std::uint64_t>(fixture.number));
    detail::MatchEngine engine(season, fixture, splitmix64(sm));
    return engine.run();
}

} // namespace pitchloop::demo
