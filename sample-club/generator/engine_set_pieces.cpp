#include "match_engine.h"

#include <algorithm>
#include <cmath>

namespace pitchloop::demo::detail {

void MatchEngine::restart() {
    applyDueSubstitutions();
    if (m_restart != Restart::KickOff && m_rng.chance(0.02)) {
        advance(m_rng.uniform(40.0, 110.0)); // a player down and treated before the restart
    }
    const Restart kind = m_restart;
    m_restart = Restart::None;
    switch (kind) {
    case Restart::KickOff:
        takeKickOff();
        break;
    case Restart::ThrowIn:
        takeThrowIn();
        break;
    case Restart::GoalKick:
        takeGoalKick();
        break;
    case Restart::Corner:
        takeCorner();
        break;
    case Restart::FreeKick:
        takeFreeKick();
        break;
    case Restart::KeeperHold:
        keeperDistribution(GainContext::KeeperHold);
        break;
    case Restart::None:
        break;
    }
}

void MatchEngine::takeKickOff() {
    const int a = m_side;
    const Point centre{m_len / 2.0, m_wid / 2.0};
    m_holder = kStrikerSlot;
    m_ball = centre;
    const Point dest =
        clampToPitch({centre.x - m_rng.uniform(7.0, 14.0), centre.y + m_rng.normal(0.0, 6.0)}, 1.0);
    const int receiver = nearestPlayer(a, dest, true, false, kStrikerSlot);
    MatchEvent ev = makeEvent(a, m_holder, EventType::Pass, Outcome::Ok, centre);
    ev.hasEnd = true;
    ev.toX = dest.x;
    ev.toY = dest.y;
    ev.tags = static_cast<std::uint32_t>(Tag::KickOff);
    emit(std::move(ev), GainContext::KickOff);
    advance(m_rng.uniform(1.5, 3.0));
    give(a, receiver, dest);
}

void MatchEngine::takeThrowIn() {
    const int a = m_side;
    m_holder = nearestPlayer(a, m_ball, true, false);
    preparePress(a, GainContext::ThrowIn);
    m_pendingContext = GainContext::ThrowIn;
    playPass(PassKind::Normal, static_cast<std::uint32_t>(Tag::ThrowIn), 0.8 + style(a).passSkill);
}

void MatchEngine::takeGoalKick() {
    const int a = m_side;
    m_holder = kKeeperSlot;
    preparePress(a, GainContext::GoalKick);
    m_pendingContext = GainContext::GoalKick;
    const auto tags = static_cast<std::uint32_t>(Tag::GoalKick);
    if (m_rng.chance(0.45 - style(a).directness)) {
        playPass(PassKind::Normal, tags, 0.97);
    } else {
        playPass(PassKind::Long, tags);
    }
}

void MatchEngine::takeCorner() {
    const int a = m_side;
    m_holder = nearestPlayer(a, m_ball, true, false);
    preparePress(a, GainContext::Corner);
    m_pendingContext = GainContext::Corner;
    const std::uint32_t tags = Tag::Corner | Tag::SetPiece;
    if (m_rng.chance(0.15)) {
        playPass(PassKind::Normal, tags, 0.9);
    } else {
        playPass(PassKind::Cross, tags, 0.3 + style(a).passSkill);
    }
}

void MatchEngine::takeFreeKick() {
    const int a = m_side;
    const Point b = m_ball;
    m_holder = nearestPlayer(a, b, true, false);
    preparePress(a, GainContext::FreeKick);
    const std::uint32_t tags = Tag::FreeKick | Tag::SetPiece;
    const double dx = m_len - b.x;
    const double dy = std::abs(b.y - m_wid / 2.0);
    if (dx < 30.0 && dy < 15.0 && m_rng.chance(0.4)) {
        takeShot(tags);
        return;
    }
    m_pendingContext = GainContext::FreeKick;
    if (b.x > m_len * 0.66 && m_rng.chance(0.55)) {
        playPass(PassKind::Cross, tags, 0.3 + style(a).passSkill);
    } else {
        playPass(PassKind::Normal, tags, 0.94);
    }
}

void MatchEngine::keeperDistribution(GainContext ctx) {
    const int a = m_side;
    m_holder = kKeeperSlot;
    if (ctx == GainContext::KeeperHold) {
        // The keeper walks the ball to the edge of the box before releasing it.
        m_ball =
            clampToPitch({m_rng.uniform(8.0, 15.0), m_wid / 2.0 + m_rng.normal(0.0, 7.0)}, 1.0);
    }
    m_pendingContext = ctx;
    if (m_rng.chance(ctx == GainContext::OpenPlay ? 0.65 : 0.55 - style(a).directness)) {
        playPass(PassKind::Normal, 0, 0.96);
    } else {
        playPass(PassKind::Long);
    }
}

void MatchEngine::takeShot(std::uint32_t tags, bool hurried) {
    const int a = m_side;
    const int d = other(a);
    const Point b = m_ball;
    const bool header = hasTag(tags, Tag::Header);
    const bool direct = hasTag(tags, Tag::FreeKick);
    const double angle = goalAngle(b);
    double xg = std::min(0.5, 0.01 + 0.33 * angle * angle);
    if (header) {
        xg *= 0.55;
    }
    if (direct) {
        xg = 0.065;
    }
    xg *= style(a).finishing / style(d).keeping;

    Outcome outcome = Outcome::Off;
    if (hurried) {
        const std::array<double, 3> wt{0.55, 0.30, 0.15};
        const std::array<Outcome, 3> pick{Outcome::Blocked, Outcome::Saved, Outcome::Off};
        outcome = pick[m_rng.weighted(wt)];
    } else if (m_rng.chance(xg)) {
        outcome = Outcome::Goal;
    } else {
        const double blocked = direct ? 0.35 : (header ? 0.1 : (inBox(b) ? 0.24 : 0.33));
        const std::array<double, 4> wt{blocked, 0.31, 0.38, 0.03};
        const std::array<Outcome, 4> pick{Outcome::Blocked, Outcome::Saved, Outcome::Off,
                                          Outcome::Post};
        outcome = pick[m_rng.weighted(wt)];
    }

    MatchEvent ev = makeEvent(a, m_holder, EventType::Shot, outcome, b);
    ev.tags = tags;
    emit(std::move(ev));
    if (m_whistle) {
        return;
    }
    if (!hurried && outcome != Outcome::Blocked && m_rng.chance(0.07)) {
        const Point p = flip(b);
        emit(makeEvent(d, pickDefender(d, p), EventType::Block, Outcome::Fail, p));
    }

    switch (outcome) {
    case Outcome::Goal:
        setRestart(Restart::KickOff, d, {m_len / 2.0, m_wid / 2.0}, m_rng.uniform(50.0, 95.0));
        break;
    case Outcome::Saved:
        advance(m_rng.uniform(0.3, 0.9));
        shotSaved(b, hurried);
        break;
    case Outcome::Blocked:
        advance(m_rng.uniform(0.1, 0.4));
        shotBlocked(b, hurried);
        break;
    case Outcome::Post:
        advance(m_rng.uniform(0.5, 0.9));
        if (m_rng.chance(0.15)) {
            ballOut(a, m_holder,
                    {m_len, std::clamp(m_wid / 2.0 + m_rng.normal(0.0, 6.0), 1.0, m_wid - 1.0)});
        } else {
            looseBall(a, {m_len - m_rng.uniform(3.0, 12.0), m_wid / 2.0 + m_rng.normal(0.0, 7.0)},
                      0.42);
        }
        break;
    default:
        advance(m_rng.uniform(0.8, 1.8));
        ballOut(a, m_holder,
                {m_len, std::clamp(m_wid / 2.0 + m_rng.normal(0.0, 7.0), 1.0, m_wid - 1.0)});
        break;
    }
}

void MatchEngine::shotSaved(Point shotAt, bool hurried) {
    const int a = m_side;
    const int d = other(a);
    const Point kp = clampToPitch({m_rng.uniform(0.5, 4.0), m_wid / 2.0 + m_rng.normal(0.0, 1.5) +
                                                                (m_wid / 2.0 - shotAt.y) * 0.05},
                                  0.3);
    const double r = hurried ? 0.0 : m_rng.uniform();
    if (r < 0.55) {
        emit(makeEvent(d, kKeeperSlot, EventType::Keeper, Outcome::Ok, kp),
             GainContext::KeeperHold);
        setRestart(Restart::KeeperHold, d, kp, m_rng.uniform(3.0, 8.0));
        m_holder = kKeeperSlot;
    } else if (r < 0.8) {
        emit(makeEvent(d, kKeeperSlot, EventType::Keeper, Outcome::Ok, kp), GainContext::Corner);
        advance(m_rng.uniform(0.5, 1.0));
        const double side = kp.y < m_wid / 2.0 ? -1.0 : 1.0;
        ballOut(d, kKeeperSlot, {0.0, m_wid / 2.0 + side * m_rng.uniform(4.0, 10.0)});
    } else {
        emit(makeEvent(d, kKeeperSlot, EventType::Keeper, Outcome::Ok, kp));
        advance(m_rng.uniform(0.8, 1.5));
        looseBall(a, {m_len - m_rng.uniform(4.0, 12.0), m_wid / 2.0 + m_rng.normal(0.0, 7.0)},
                  0.45);
    }
}

void MatchEngine::shotBlocked(Point shotAt, bool hurried) {
    const int a = m_side;
    const int d = other(a);
    const Point bp = flip(
        clampToPitch({shotAt.x + m_rng.uniform(0.5, 2.5), shotAt.y + m_rng.normal(0.0, 1.0)}, 0.5));
    const int slot = pickDefender(d, bp);
    emit(makeEvent(d, slot, EventType::Block, Outcome::Ok, bp));
    advance(m_rng.uniform(0.4, 1.0));
    if (hurried) {
        looseBall(d, {bp.x + m_rng.uniform(1.0, 4.0), bp.y + m_rng.normal(0.0, 2.0)}, 1.0);
        return;
    }
    const double r = m_rng.uniform();
    if (r < 0.45) {
        looseBall(d, {bp.x + m_rng.uniform(2.0, 10.0), bp.y + m_rng.normal(0.0, 5.0)}, 1.0);
    } else if (r < 0.78) {
        looseBall(a, {shotAt.x - m_rng.uniform(2.0, 10.0), shotAt.y + m_rng.normal(0.0, 5.0)}, 1.0);
    } else {
        const double side = bp.y < m_wid / 2.0 ? -1.0 : 1.0;
        ballOut(d, slot, {0.0, m_wid / 2.0 + side * m_rng.uniform(5.0, 15.0)});
    }
}

// A ball nobody controls: `favouredSide` wins it with probability `favouredShare`.
void MatchEngine::looseBall(int favouredSide, Point at, double favouredShare) {
    int s = favouredSide;
    Point p = clampToPitch(at, 0.5);
    if (!m_rng.chance(favouredShare)) {
        s = other(s);
        p = flip(p);
    }
    const int slot = pickDefender(s, p);
    emit(makeEvent(s, slot, EventType::Recovery, Outcome::Ok, p));
    give(s, slot, p);
    advance(m_rng.uniform(0.6, 1.5));
}

// `crossing` is where the ball left the pitch, in the frame of the side that touched it last.
void MatchEngine::ballOut(int lastTouch, int slot, Point crossing) {
    emit(makeEvent(lastTouch, slot, EventType::Out, Outcome::None, crossing));
    const int r = other(lastTouch);
    const Point p = flip(crossing);
    const bool touchline = crossing.y <= 0.01 || crossing.y >= m_wid - 0.01;
    if (touchline) {
        setRestart(Restart::ThrowIn, r,
                   {std::clamp(p.x, 0.5, m_len - 0.5), p.y < m_wid / 2.0 ? 0.0 : m_wid},
                   m_rng.uniform(8.0, 20.0));
    } else if (crossing.x >= m_len - 0.01) {
        setRestart(Restart::GoalKick, r,
                   {5.5, p.y < m_wid / 2.0 ? m_wid / 2.0 - 5.0 : m_wid / 2.0 + 5.0},
                   m_rng.uniform(16.0, 30.0));
        m_holder = kKeeperSlot;
    } else {
        setRestart(Restart::Corner, r, {m_len, p.y < m_wid / 2.0 ? 0.0 : m_wid},
                   m_rng.uniform(22.0, 42.0));
    }
}

void MatchEngine::clearance() {
    const int a = m_side;
    const int d = other(a);
    const Point b = m_ball;
    if (m_rng.chance(0.12)) {
        emit(makeEvent(a, m_holder, EventType::Clearance, Outcome::Fail, b));
        advance(m_rng.uniform(0.5, 1.0));
        looseBall(d, flip({b.x + m_rng.uniform(3.0, 10.0), b.y + m_rng.normal(0.0, 5.0)}), 0.8);
        return;
    }
    emit(makeEvent(a, m_holder, EventType::Clearance, Outcome::Ok, b));
    advance(m_rng.uniform(2.0, 3.5));
    const Point land{b.x + m_rng.uniform(28.0, 55.0), b.y + m_rng.normal(0.0, 12.0)};
    if (m_rng.chance(0.25) || land.y < 0.0 || land.y > m_wid) {
        ballOut(a, m_holder,
                {std::clamp(land.x, 1.0, m_len - 1.0), land.y < m_wid / 2.0 ? 0.0 : m_wid});
        return;
    }
    looseBall(a, land, 0.4);
}

void MatchEngine::defensiveFoul() {
    const int a = m_side;
    const int d = other(a);
    const Point b = m_ball;
    const Point at = flip(b);
    emit(makeEvent(d, pickDefender(d, at), EventType::Foul, Outcome::None, at));
    setRestart(Restart::FreeKick, a, b, m_rng.uniform(14.0, 36.0));
}

void MatchEngine::attackingFoul() {
    const int a = m_side;
    const Point b = m_ball;
    emit(makeEvent(a, m_holder, EventType::Foul, Outcome::None, b));
    setRestart(Restart::FreeKick, other(a), flip(b), m_rng.uniform(12.0, 30.0));
}

} // namespace pitchloop::demo::detail
