#include "match_engine.h"

#include <algorithm>
#include <cmath>

namespace pitchloop::demo::detail {
namespace {

double distance(Point a, Point b) {
    return std::sqrt((a.x - b.x) * (a.x - b.x) + (a.y - b.y) * (a.y - b.y));
}

Point lerp(Point a, Point b, double f) {
    return {a.x + (b.x - a.x) * f, a.y + (b.y - a.y) * f};
}

bool isBackLine(Role role) {
    switch (role) {
    case Role::RightBack:
    case Role::RightCentreBack:
    case Role::CentreBack:
    case Role::LeftCentreBack:
    case Role::LeftBack:
    case Role::DefensiveMid:
        return true;
    default:
        return false;
    }
}

std::uint32_t kindTags(PassKind kind) {
    switch (kind) {
    case PassKind::Long:
        return static_cast<std::uint32_t>(Tag::LongBall);
    case PassKind::Through:
        return static_cast<std::uint32_t>(Tag::ThroughBall);
    case PassKind::Cross:
        return static_cast<std::uint32_t>(Tag::Cross);
    case PassKind::Cutback:
        return static_cast<std::uint32_t>(Tag::Cutback);
    default:
        return 0;
    }
}

} // namespace

void MatchEngine::openPlay() {
    const int a = m_side;
    const int d = other(a);
    if (m_press.active && (m_clock > m_press.deadline || m_press.pressing != d)) {
        m_press.active = false;
    }
    if (m_press.active && m_press.wins) {
        if (m_press.quickActions > 0 && m_press.deadline - m_clock > 35) {
            --m_press.quickActions;
            quickAction();
        } else {
            counterPressWins();
        }
        return;
    }
    if (m_press.active) {
        escapePress();
        return;
    }
    if (m_holder == kKeeperSlot) {
        keeperDistribution(GainContext::OpenPlay);
        return;
    }

    const Point b = m_ball;
    const Role role = slotOf(a, m_holder).role;
    const TeamStyle& st = style(a);
    const double w = exposure(a);
    const bool overload = w > 0.0 && inOverloadZone(b);
    const int zoneThird = third(b.x);
    const bool wide = b.y < m_wid * 0.2 || b.y > m_wid * 0.8;
    const double centreOffset = std::abs(b.y - m_wid / 2.0);

    enum Choice : std::size_t {
        Shot,
        Cross,
        Cutback,
        Through,
        TakeOn,
        Carry,
        Clear,
        FoulAgainst,
        FoulBy,
        Long,
        Pass,
        ChoiceCount
    };
    std::array<double, ChoiceCount> wt{};
    wt[Shot] = shotChance(b) * st.attack * (1.0 + 4.0 * m_homeEdge[static_cast<std::size_t>(a)]);
    if (w > 0.0 && m_clock - m_overloadPassAt <= 100) {
        // Served from the overload: the runner arrives unmarked because our cover went wide.
        wt[Shot] *= 1.0 + 2.0 * w;
    }
    if (zoneThird == 2 && wide && b.x > m_len * 0.72) {
        wt[Cross] = 0.2;
    }
    if (overload) {
        // Early low balls from the pocket outside our box while our left-back is outnumbered.
        wt[Cross] = 0.12 + 0.18 * w;
    }
    if (b.x > m_len - 16.0 && centreOffset > 9.0) {
        wt[Cutback] = 0.12;
    }
    if (b.x > m_len * 0.35 && b.x < m_len * 0.75 && !isBackLine(role)) {
        wt[Through] = 0.04;
    }
    const bool dribbler = isForward(role) || role == Role::RightMid || role == Role::LeftMid;
    if (b.x > m_len * 0.5) {
        wt[TakeOn] = dribbler ? 0.07 : 0.018;
    } else {
        wt[TakeOn] = dribbler ? 0.02 : 0.005;
    }
    if (overload) {
        wt[TakeOn] += 0.05 * w;
    }
    wt[Carry] = zoneThird == 0 ? 0.24 : 0.2;
    if (b.x < kBoxDepth && centreOffset < kBoxHalfWidth) {
        wt[Clear] = 0.2;
    } else if (b.x < 25.0) {
        wt[Clear] = 0.06;
    }
    wt[FoulAgainst] = 0.0105 * style(d).foulRate * (zoneThird == 1 ? 1.25 : 1.0);
    wt[FoulBy] = 0.002;
    if (b.x < m_len * 0.42 && isBackLine(role)) {
        wt[Long] = st.directness * 1.6;
    }
    double used = 0.0;
    for (double v : wt) {
        used += v;
    }
    wt[Pass] = std::max(0.3, 1.0 - used);

    switch (m_rng.weighted(wt)) {
    case Shot:
        takeShot(0);
        break;
    case Cross:
        playPass(PassKind::Cross);
        break;
    case Cutback:
        playPass(PassKind::Cutback);
        break;
    case Through:
        playPass(PassKind::Through);
        break;
    case TakeOn:
        playTakeOn();
        break;
    case Carry:
        playCarry(false);
        break;
    case Clear:
        clearance();
        break;
    case FoulAgainst:
        defensiveFoul();
        break;
    case FoulBy:
        attackingFoul();
        break;
    case Long:
        playPass(PassKind::Long);
        break;
    default:
        playPass(PassKind::Normal);
        break;
    }
}

// The press has been beaten: the carrier gets out of trouble before the 5 s window closes.
void MatchEngine::escapePress() {
    const int d = other(m_side);
    if (m_holder != kKeeperSlot && m_rng.chance(0.05)) {
        const Point p = flip(m_ball);
        emit(makeEvent(d, pickDefender(d, p), EventType::Tackle, Outcome::Fail, p));
        advance(m_rng.uniform(0.2, 0.5));
    }
    if (m_holder != kKeeperSlot && m_rng.chance(0.3)) {
        playCarry(true);
    } else {
        playPass(PassKind::Safe);
    }
}

// A hurried touch by the side being counter-pressed, before the press wins the ball.
void MatchEngine::quickAction() {
    playPass(PassKind::Quick);
}

void MatchEngine::counterPressWins() {
    const int b = m_side;
    const int a = m_press.pressing;
    const Point at = m_ball;
    m_hardDeadline = std::max(m_press.deadline, m_clock);
    const double room = (m_hardDeadline - m_clock) / 10.0;

    enum Way : std::size_t { Tackle, Intercept, HeavyTouch, Foul, Out, HurriedShot, WayCount };
    std::array<double, WayCount> wt{0.25, 0.22, 0.38, 0.05, 0.0, 0.0};
    if (at.y < 6.0 || at.y > m_wid - 6.0) {
        wt[Out] = 0.15;
    }
    if (m_holder != kKeeperSlot && shotChance(at) > 0.05) {
        wt[HurriedShot] = 0.35;
    }
    if (m_holder == kKeeperSlot) {
        wt = {0.0, 1.0, 0.0, 0.0, 0.0, 0.0};
    }

    switch (m_rng.weighted(wt)) {
    case Tackle: {
        advance(m_rng.uniform(0.3, std::max(0.3, std::min(1.2, room))));
        const Point p = flip(at);
        const int slot = pickDefender(a, p);
        emit(makeEvent(a, slot, EventType::Tackle, Outcome::Ok, p));
        give(a, slot, p);
        advance(m_rng.uniform(0.5, 1.2));
        break;
    }
    case Intercept: {
        const Point dest =
            clampToPitch({at.x + m_rng.uniform(6.0, 15.0), at.y + m_rng.normal(0.0, 6.0)}, 1.0);
        MatchEvent ev = makeEvent(b, m_holder, EventType::Pass, Outcome::Fail, at);
        ev.hasEnd = true;
        ev.toX = dest.x;
        ev.toY = dest.y;
        emit(std::move(ev));
        const Point p = flip(lerp(at, dest, m_rng.uniform(0.3, 0.8)));
        advance(m_rng.uniform(0.3, 0.9));
        const int slot = pickDefender(a, p);
        emit(makeEvent(a, slot, EventType::Interception, Outcome::Ok, p));
        give(a, slot, p);
        advance(m_rng.uniform(0.5, 1.2));
        break;
    }
    case HeavyTouch: {
        const Point end =
            clampToPitch({at.x + m_rng.uniform(2.0, 5.0), at.y + m_rng.normal(0.0, 2.0)}, 1.0);
        MatchEvent ev = makeEvent(b, m_holder, EventType::Carry, Outcome::Fail, at);
        ev.hasEnd = true;
        ev.toX = end.x;
        ev.toY = end.y;
        emit(std::move(ev));
        advance(m_rng.uniform(0.6, 1.2));
        const Point p = flip(end);
        const int slot = pickDefender(a, p);
        emit(makeEvent(a, slot, EventType::Recovery, Outcome::Ok, p));
        give(a, slot, p);
        advance(m_rng.uniform(0.5, 1.2));
        break;
    }
    case Foul:
        advance(m_rng.uniform(0.3, 1.0));
        emit(makeEvent(b, m_holder, EventType::Foul, Outcome::None, at));
        setRestart(Restart::FreeKick, a, flip(at), m_rng.uniform(12.0, 30.0));
        break;
    case Out:
        advance(m_rng.uniform(0.4, 1.0));
        ballOut(b, m_holder, {at.x, at.y < m_wid / 2.0 ? 0.0 : m_wid});
        break;
    default:
        takeShot(0, true);
        break;
    }
    m_hardDeadline = 0;
    if (m_press.pressing == a) {
        m_press.active = false;
    }
}

void MatchEngine::playPass(PassKind kind, std::uint32_t tags, double successOverride) {
    const int a = m_side;
    const int d = other(a);
    const Point from = m_ball;
    Point dest;
    const int receiver = pickReceiver(kind, dest);
    double p = successOverride >= 0.0 ? successOverride : passSuccess(from, dest, kind);
    const bool escaping = m_press.active && !m_press.wins && m_press.pressing == d;
    if (kind == PassKind::Safe || kind == PassKind::Quick || escaping) {
        p = 1.0;
    }
    tags |= kindTags(kind);
    const bool ok = m_rng.chance(p);

    MatchEvent ev = makeEvent(a, m_holder, EventType::Pass, ok ? Outcome::Ok : Outcome::Fail, from);
    ev.hasEnd = true;
    ev.toX = dest.x;
    ev.toY = dest.y;
    ev.tags = tags;
    const GainContext ctx = m_pendingContext;
    m_pendingContext = GainContext::OpenPlay;
    emit(std::move(ev), ctx);

    const double length = distance(from, dest);
    const bool lofted = kind == PassKind::Long || kind == PassKind::Cross;
    const double speed =
        lofted ? m_rng.uniform(14.0, 19.0)
               : (kind == PassKind::Quick ? m_rng.uniform(12.0, 17.0) : m_rng.uniform(10.0, 16.0));
    const double travel = length / speed + 0.2;
    if (!ok) {
        passFailed(from, dest, kind, travel);
        return;
    }
    if (kind == PassKind::Normal && length > 12.0 && m_rng.chance(0.035)) {
        const Point mid = flip(lerp(from, dest, m_rng.uniform(0.3, 0.7)));
        advance(travel * 0.5);
        emit(makeEvent(d, pickDefender(d, mid), EventType::Interception, Outcome::Fail, mid));
        advance(travel * 0.5);
    } else {
        advance(travel);
    }
    give(a, receiver, dest);
    const double w = exposure(a);
    if (w > 0.0 && inOverloadZone(from)) {
        m_overloadPassAt = m_clock;
    }

    if ((kind == PassKind::Cross || kind == PassKind::Cutback) && inBox(dest)) {
        const double served = inOverloadZone(from) ? 0.25 * w : 0.0;
        if (m_rng.chance((kind == PassKind::Cross ? 0.55 : 0.45) + served)) {
            advance(m_rng.uniform(0.1, 0.4));
            std::uint32_t shotTags =
                kind == PassKind::Cross ? static_cast<std::uint32_t>(Tag::Header) : 0u;
            if (hasTag(tags, Tag::SetPiece)) {
                shotTags = shotTags | Tag::SetPiece;
            }
            takeShot(shotTags);
            return;
        }
    }
    const bool hurried = kind == PassKind::Quick || kind == PassKind::Safe;
    advance(hurried ? m_rng.uniform(0.3, 0.8) : m_rng.uniform(1.0, 2.5));
}

int MatchEngine::pickReceiver(PassKind kind, Point& dest) {
    const int a = m_side;
    const Point b = m_ball;
    const double w = exposure(a);
    std::array<Point, 11> pos{};
    for (int j = 0; j < 11; ++j) {
        pos[static_cast<std::size_t>(j)] = slotPosition(a, j, b, true);
    }
    std::array<double, 11> wt{};

    if (kind == PassKind::Cross || kind == PassKind::Cutback) {
        if (kind == PassKind::Cross) {
            dest = {m_len - m_rng.uniform(3.0, 13.0), m_wid / 2.0 + m_rng.normal(0.0, 5.5)};
        } else {
            dest = {m_len - m_rng.uniform(8.0, 16.0), m_wid / 2.0 + m_rng.normal(0.0, 4.5)};
        }
        dest = clampToPitch(dest, 1.0);
        for (int j = 1; j < 11; ++j) {
            if (j == m_holder) {
                continue;
            }
            const Role role = slotOf(a, j).role;
            const double factor = isForward(role) ? 2.0 : (isBackLine(role) ? 0.4 : 1.0);
            const double dd = distance(pos[static_cast<std::size_t>(j)], dest) / 10.0;
            wt[static_cast<std::size_t>(j)] = factor / (1.0 + dd * dd);
        }
        return static_cast<int>(m_rng.weighted(wt));
    }

    if (kind == PassKind::Long || kind == PassKind::Through) {
        bool any = false;
        for (int j = 1; j < 11; ++j) {
            const Point p = pos[static_cast<std::size_t>(j)];
            if (j != m_holder && p.x > b.x + 8.0) {
                const double forward = isForward(slotOf(a, j).role) ? 2.0 : 1.0;
                wt[static_cast<std::size_t>(j)] = (p.x - b.x) * forward;
                any = true;
            }
        }
        if (any) {
            const int j = static_cast<int>(m_rng.weighted(wt));
            const double lead =
                kind == PassKind::Through ? m_rng.uniform(6.0, 14.0) : m_rng.uniform(2.0, 9.0);
            const Point p = pos[static_cast<std::size_t>(j)];
            dest = clampToPitch({std::min(p.x + lead, m_len - 4.0), p.y + m_rng.normal(0.0, 3.0)},
                                0.5);
            return j;
        }
        wt.fill(0.0);
    }

    const bool storyActive = a == kOpp && w > 0.0 && b.x >= m_len * 0.4;
    for (int j = 0; j < 11; ++j) {
        if (j == m_holder) {
            continue;
        }
        const Point p = pos[static_cast<std::size_t>(j)];
        const double dd = distance(p, b);
        if (kind == PassKind::Quick && dd > 18.0) {
            continue;
        }
        double wj = 1.0 / (1.0 + (dd / 16.0) * (dd / 16.0));
        if (dd < 5.0) {
            wj *= 0.3;
        }
        if (kind == PassKind::Normal) {
            wj *= 1.0 + 0.35 * std::clamp((p.x - b.x) / 20.0, -0.8, 1.2);
        }
        const Role role = slotOf(a, j).role;
        if (j == kKeeperSlot) {
            wj *= b.x < m_len * 0.3 ? 1.0 : 0.02;
        } else if (role == Role::Striker) {
            wj *= 0.55; // marked tight; most play goes through the midfield and the flanks
        } else if (isForward(role)) {
            wj *= 0.85;
        }
        if (storyActive && (isRightFlank(role) || role == Role::RightCentreMid)) {
            wj *= 1.0 + (inOverloadZone(b) ? 0.6 : 0.3) * w;
        }
        wt[static_cast<std::size_t>(j)] = wj;
    }
    const int j = static_cast<int>(m_rng.weighted(wt));
    const Point p = pos[static_cast<std::size_t>(j)];
    const double lead = kind == PassKind::Normal ? 1.0 : 0.0;
    dest = {p.x + lead + m_rng.normal(0.0, 2.5), p.y + m_rng.normal(0.0, 2.5)};

    // Story: the overload means the right-back, right winger and right No. 8 keep finding each
    // other in the pocket outside our box on our left.
    const Role role = slotOf(a, j).role;
    if (storyActive && kind == PassKind::Normal &&
        (isRightFlank(role) || role == Role::RightCentreMid) && b.x < m_len * 0.85 &&
        b.y < m_wid * 0.65 && m_rng.chance(0.2 * w)) {
        const Point pocket{m_rng.uniform(m_len * 4.0 / 6.0 + 1.0, m_len * 5.0 / 6.0 - 1.0),
                           m_rng.uniform(1.5, m_wid / 5.0 - 1.0)};
        if (distance(pocket, b) > 5.0) {
            dest = pocket;
        }
    }
    dest = clampToPitch(dest, 0.5);
    dest.x = std::min(dest.x, m_len - 3.0);
    return j;
}

double MatchEngine::passSuccess(Point from, Point to, PassKind kind) const {
    const int a = m_side;
    const double w = exposure(a);
    const double length = distance(from, to);
    double p = 0.0;
    switch (kind) {
    case PassKind::Cross:
        p = 0.24;
        break;
    case PassKind::Cutback:
        p = 0.5;
        break;
    case PassKind::Through:
        p = 0.36;
        break;
    case PassKind::Long:
        p = 0.52 - 0.003 * std::max(0.0, length - 35.0);
        break;
    default: {
        p = 0.935 - 0.0035 * std::max(0.0, length - 15.0);
        if (to.x > m_len * 2.0 / 3.0) {
            p -= 0.10;
        }
        if (inBox(to)) {
            p -= 0.12;
        }
        if (from.x > m_len * 2.0 / 3.0) {
            p -= 0.10;
        }
        const bool wideFrom = from.y < m_wid / 5.0 || from.y > m_wid * 4.0 / 5.0;
        if (third(from.x) == 2 && !wideFrom) {
            p -= 0.04; // crowded centre in front of the box
        }
        if (third(from.x) == 1 && wideFrom) {
            p -= 0.03; // pressed against the touchline in midfield
        }
        const double gain = to.x - from.x;
        if (gain > 12.0) {
            p -= 0.04;
        } else if (gain < -3.0) {
            p += 0.04;
        }
        break;
    }
    }
    p += style(a).passSkill + m_homeEdge[static_cast<std::size_t>(a)];
    if (w > 0.0) {
        if (inOverloadZone(from)) {
            p += (kind == PassKind::Cross || kind == PassKind::Cutback ? 0.15 : 0.08) * w;
        } else if (inOverloadZone(to)) {
            p += 0.08 * w;
        }
    }
    return std::clamp(p, 0.08, 0.98);
}

void MatchEngine::passFailed(Point from, Point to, PassKind kind, double travel) {
    const int a = m_side;
    const int d = other(a);
    if (kind == PassKind::Cross) {
        advance(travel);
        crossDefended(to);
        return;
    }
    double pOut = 0.22;
    if (to.y < 3.0 || to.y > m_wid - 3.0) {
        pOut = 0.5;
    }
    if (to.x > m_len - 4.0) {
        pOut = 0.5;
    }
    if (kind == PassKind::Long) {
        pOut = std::max(pOut, 0.15);
    } else if (kind == PassKind::Through) {
        pOut = std::max(pOut, 0.25);
    }
    if (m_rng.chance(pOut)) {
        advance(travel + 0.4);
        Point crossing;
        if (to.x > m_len - 4.0 || (kind == PassKind::Through && m_rng.chance(0.6))) {
            crossing = {m_len, std::clamp(to.y, 1.0, m_wid - 1.0)};
        } else {
            crossing = {std::clamp(to.x, 0.5, m_len - 0.5), to.y < m_wid / 2.0 ? 0.0 : m_wid};
        }
        ballOut(a, m_holder, crossing);
        return;
    }
    if (kind == PassKind::Long && m_rng.chance(0.35)) {
        // Headed away: nobody controls it yet.
        advance(travel);
        const Point p = flip(to);
        const int slot = pickDefender(d, p);
        MatchEvent ev = makeEvent(d, slot, EventType::Clearance, Outcome::Ok, p);
        ev.tags = static_cast<std::uint32_t>(Tag::Header);
        emit(std::move(ev));
        advance(m_rng.uniform(1.0, 2.0));
        looseBall(d, {p.x + m_rng.uniform(8.0, 20.0), p.y + m_rng.normal(0.0, 8.0)}, 0.55);
        return;
    }
    if (kind == PassKind::Long && m_rng.chance(0.55)) {
        // Lost in the air: the defender heads it to a team-mate.
        advance(travel);
        const Point p = flip(to);
        const int slot = pickDefender(d, p);
        MatchEvent ev = makeEvent(d, slot, EventType::Interception, Outcome::Ok, p);
        ev.tags = static_cast<std::uint32_t>(Tag::Header);
        emit(std::move(ev));
        give(d, slot, p);
        advance(m_rng.uniform(0.8, 1.6));
        return;
    }
    if (to.x > m_len * 2.0 / 3.0 && m_rng.chance(0.35)) {
        // Into a packed defence: hacked away rather than controlled.
        advance(travel);
        const Point p = flip(to);
        const int slot = pickDefender(d, p);
        emit(makeEvent(d, slot, EventType::Clearance, Outcome::Ok, p));
        advance(m_rng.uniform(1.2, 2.4));
        if (p.x < 12.0 && m_rng.chance(0.2)) {
            ballOut(
                d, slot,
                {0.0, m_wid / 2.0 + (p.y < m_wid / 2.0 ? -1.0 : 1.0) * m_rng.uniform(6.0, 20.0)});
            return;
        }
        if (m_rng.chance(0.15)) {
            ballOut(d, slot,
                    {std::clamp(p.x + m_rng.uniform(10.0, 30.0), 1.0, m_len - 1.0),
                     p.y < m_wid / 2.0 ? 0.0 : m_wid});
            return;
        }
        looseBall(d, {p.x + m_rng.uniform(15.0, 35.0), p.y + m_rng.normal(0.0, 10.0)}, 0.55);
        return;
    }
    if (m_rng.chance(0.3)) {
        const double f = m_rng.uniform(0.35, 0.95);
        const Point p = flip(lerp(from, to, f));
        advance(travel * f);
        const int slot = pickDefender(d, p);
        emit(makeEvent(d, slot, EventType::Interception, Outcome::Ok, p));
        give(d, slot, p);
    } else {
        const Point land =
            clampToPitch({to.x + m_rng.normal(0.0, 2.0), to.y + m_rng.normal(0.0, 2.0)});
        advance(travel + 0.6);
        const Point p = flip(land);
        const int slot = pickDefender(d, p);
        emit(makeEvent(d, slot, EventType::Recovery, Outcome::Ok, p));
        give(d, slot, p);
    }
    advance(m_rng.uniform(0.6, 1.5));
}

void MatchEngine::crossDefended(Point to) {
    const int a = m_side;
    const int d = other(a);
    const Point p = flip(to);
    const double r = m_rng.uniform();
    if (r < 0.48) {
        const int slot = pickDefender(d, p);
        MatchEvent ev = makeEvent(d, slot, EventType::Clearance, Outcome::Ok, p);
        ev.tags = static_cast<std::uint32_t>(Tag::Header);
        emit(std::move(ev));
        advance(m_rng.uniform(1.2, 2.2));
        if (m_rng.chance(0.14)) {
            // Headed behind for a corner.
            ballOut(
                d, slot,
                {0.0, m_wid / 2.0 + (p.y < m_wid / 2.0 ? -1.0 : 1.0) * m_rng.uniform(6.0, 20.0)});
            return;
        }
        if (m_rng.chance(0.07)) {
            ballOut(d, slot,
                    {std::clamp(p.x + m_rng.uniform(10.0, 25.0), 1.0, m_len - 1.0),
                     p.y < m_wid / 2.0 ? 0.0 : m_wid});
            return;
        }
        looseBall(d, {p.x + m_rng.uniform(12.0, 35.0), m_rng.uniform(5.0, m_wid - 5.0)}, 0.55);
    } else if (r < 0.66) {
        const Point kp = {std::min(p.x, m_rng.uniform(2.0, 9.0)), p.y};
        emit(makeEvent(d, kKeeperSlot, EventType::Keeper, Outcome::Ok, kp),
             GainContext::KeeperHold);
        setRestart(Restart::KeeperHold, d, kp, m_rng.uniform(3.0, 7.0));
        m_holder = kKeeperSlot;
    } else if (r < 0.74) {
        const int slot = pickDefender(d, p);
        emit(makeEvent(d, slot, EventType::Block, Outcome::Ok, p));
        advance(m_rng.uniform(0.4, 0.9));
        ballOut(d, slot,
                {0.0, m_wid / 2.0 + (p.y < m_wid / 2.0 ? -1.0 : 1.0) * m_rng.uniform(5.0, 15.0)});
    } else if (r < 0.82) {
        const int slot = pickDefender(d, p);
        emit(makeEvent(d, slot, EventType::Clearance, Outcome::Fail, p));
        advance(m_rng.uniform(0.5, 1.0));
        looseBall(a, {to.x - m_rng.uniform(1.0, 6.0), to.y + m_rng.normal(0.0, 3.0)}, 0.8);
    } else if (r < 0.86) {
        emit(
            makeEvent(d, kKeeperSlot, EventType::Keeper, Outcome::Fail, {std::min(p.x, 8.0), p.y}));
        advance(m_rng.uniform(0.5, 1.0));
        looseBall(a, {to.x - m_rng.uniform(0.0, 5.0), to.y + m_rng.normal(0.0, 4.0)}, 0.5);
    } else {
        ballOut(a, m_holder,
                {m_len, std::clamp(m_wid - to.y + m_rng.normal(0.0, 6.0), 1.0, m_wid - 1.0)});
    }
}

void MatchEngine::playCarry(bool forceOk) {
    const int a = m_side;
    const int d = other(a);
    const Point b = m_ball;
    const int zoneThird = third(b.x);
    const double len = m_rng.uniform(3.0, 11.0) * (zoneThird == 0 ? 1.2 : 1.0);
    Point to;
    if (b.x > m_len - 22.0) {
        // Near the box the carrier cuts in towards goal instead of running at the corner flag.
        const Point aim{m_len - m_rng.uniform(8.0, 14.0), m_wid / 2.0 + m_rng.normal(0.0, 6.0)};
        const double span = std::max(1.0, distance(b, aim));
        const double f = std::min(1.0, len * 0.6 / span);
        to = lerp(b, aim, f);
    } else {
        double drift = m_rng.normal(0.0, 3.5);
        if (b.y < 5.0) {
            drift += 2.0;
        } else if (b.y > m_wid - 5.0) {
            drift -= 2.0;
        }
        to = {b.x + len * m_rng.uniform(0.45, 1.0), b.y + drift};
    }
    to = clampToPitch(to, 1.0);
    double pFail = zoneThird == 0 ? 0.025 : (zoneThird == 1 ? 0.045 : 0.08);
    if (inOverloadZone(b)) {
        pFail -= 0.03 * exposure(a);
    }
    const bool ok = forceOk || !m_rng.chance(pFail);

    MatchEvent ev = makeEvent(a, m_holder, EventType::Carry, ok ? Outcome::Ok : Outcome::Fail, b);
    ev.hasEnd = true;
    ev.toX = to.x;
    ev.toY = to.y;
    emit(std::move(ev));
    advance(distance(b, to) / m_rng.uniform(4.5, 6.5) + 0.3);

    const Point p = flip(to);
    if (!ok) {
        const int slot = pickDefender(d, p);
        const bool tackled = m_rng.chance(0.7);
        emit(makeEvent(d, slot, tackled ? EventType::Tackle : EventType::Recovery, Outcome::Ok, p));
        give(d, slot, p);
        advance(m_rng.uniform(0.6, 1.4));
        return;
    }
    if (!forceOk && m_rng.chance(0.03)) {
        emit(makeEvent(d, pickDefender(d, p), EventType::Tackle, Outcome::Fail, p));
    }
    give(a, m_holder, to);
}

void MatchEngine::playTakeOn() {
    const int a = m_side;
    const int d = other(a);
    const Point b = m_ball;
    double p = 0.45 + 2.0 * style(a).passSkill;
    if (isForward(slotOf(a, m_holder).role)) {
        p += 0.04;
    }
    if (inOverloadZone(b)) {
        p += 0.2 * exposure(a); // our left-back left one against two
    }
    const bool ok = m_rng.chance(p);
    emit(makeEvent(a, m_holder, EventType::TakeOn, ok ? Outcome::Ok : Outcome::Fail, b));
    const Point at = flip(b);
    if (ok) {
        if (m_rng.chance(0.75)) {
            emit(makeEvent(d, pickDefender(d, at), EventType::Tackle, Outcome::Fail, at));
        }
        advance(m_rng.uniform(0.8, 1.6));
        give(a, m_holder, {b.x + m_rng.uniform(2.0, 4.0), b.y + m_rng.normal(0.0, 1.5)});
        return;
    }
    advance(m_rng.uniform(0.3, 0.8));
    const int slot = pickDefender(d, at);
    const double r = m_rng.uniform();
    if (r < 0.68) {
        emit(makeEvent(d, slot, EventType::Tackle, Outcome::Ok, at));
        give(d, slot, at);
    } else if (r < 0.85) {
        const Point loose =
            clampToPitch({at.x + m_rng.uniform(-2.0, 3.0), at.y + m_rng.normal(0.0, 2.0)});
        const int chaser = pickDefender(d, loose);
        emit(makeEvent(d, chaser, EventType::Recovery, Outcome::Ok, loose));
        give(d, chaser, loose);
    } else {
        emit(makeEvent(d, slot, EventType::Foul, Outcome::None, at));
        setRestart(Restart::FreeKick, a, b, m_rng.uniform(12.0, 35.0));
        return;
    }
    advance(m_rng.uniform(0.6, 1.4));
}

double MatchEngine::shotChance(Point p) const {
    const double dx = m_len - p.x;
    const double dy = std::abs(p.y - m_wid / 2.0);
    if (dx > 32.0) {
        return 0.0;
    }
    if (inBox(p)) {
        return 0.08 + 0.5 * goalAngle(p);
    }
    if (dx < 25.0 && dy < 16.0) {
        return 0.055;
    }
    return 0.012;
}

} // namespace pitchloop::demo::detail
