#include "moments.h"

#include "exports.h"
#include "zonenames.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace pitchloop::model {

namespace {

std::string words(std::string_view id) {
    std::string s(id);
    std::replace(s.begin(), s.end(), '_', ' ');
    return s;
}

std::string resultWord(Result r) {
    switch (r) {
    case Result::None:
    case Result::Ok: return {};
    case Result::Fail: return "failed";
    case Result::Goal: return "goal";
    case Result::Saved: return "saved";
    case Result::Blocked: return "blocked";
    case Result::Off: return "off target";
    case Result::Post: return "hit the woodwork";
    }
    return {};
}

/// "our pass (7)", "their shot (9), saved".
std::string eventWords(const Event& e) {
    std::string s = std::string(e.side == Side::Us ? "our " : "their ") +
                    (e.type == EventType::Out ? std::string("ball out") : words(toString(e.type)));
    if (!e.player.empty()) s += " (" + e.player + ")";
    if (const std::string r = resultWord(e.result); !r.empty()) s += ", " + r;
    return s;
}

std::string seconds(double s) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.1f s", s);
    return buf;
}

void addPlayer(std::vector<std::string>& players, const std::string& p) {
    if (!p.empty() && std::find(players.begin(), players.end(), p) == players.end()) players.push_back(p);
}

std::string twoDigits(long v) {
    char buf[24];
    std::snprintf(buf, sizeof buf, "%02ld", v);
    return buf;
}

std::string periodName(int period) {
    switch (period) {
    case 1: return "1st half";
    case 2: return "2nd half";
    case 3: return "extra time, 1st half";
    case 4: return "extra time, 2nd half";
    default: return "period " + std::to_string(period);
    }
}

} // namespace

std::string_view toString(MomentCount c) {
    switch (c) {
    case MomentCount::Success: return "success";
    case MomentCount::NoSuccess: return "no_success";
    case MomentCount::Censored: return "censored";
    case MomentCount::Exposure: return "exposure";
    }
    return "success";
}

std::vector<Moment> matchMoments(const Match& match, const MetricSpec& spec, const ZoneGrid& grid,
                                 std::optional<Zone> zone) {
    const MatchFacts facts(match);
    const auto& events = match.events;
    const bool followedBy = spec.success.kind == SuccessSpec::Kind::FollowedBy;
    std::vector<Moment> out;
    for (const TallyItem& it : tallyItems(facts, spec, grid)) {
        const Zone z = grid.zoneAt(it.zone);
        if (zone && !(zone->band == z.band && zone->lane == z.lane)) continue;
        const Event& e = events[it.event];
        Moment m;
        m.matchId = match.info.id;
        m.date = match.info.date;
        m.opponent = match.info.opponent;
        m.band = z.band;
        m.lane = z.lane;
        m.period = e.period;
        m.t = e.t;
        m.startT = e.t;
        m.endT = e.t;
        m.event = it.event;
        m.from = it.place;
        if (it.lastEvent) {
            // A loss: from the losing side's last touch to where the other side took the ball.
            const Event& last = events[*it.lastEvent];
            m.startT = last.t;
            m.what = std::string(last.side == Side::Us ? "we lost the ball" : "they lost the ball") +
                     " (" + (last.player.empty() ? "" : last.player + "'s ") + words(toString(last.type)) +
                     ") to " + eventWords(e);
            addPlayer(m.players, last.player);
            addPlayer(m.players, e.player);
            m.to = e.at;
        } else {
            m.what = eventWords(e);
            addPlayer(m.players, e.player);
            m.to = e.to;
        }
        if (it.exposure) {
            m.count = MomentCount::Exposure;
        } else if (it.inNum) {
            m.count = MomentCount::Success;
        } else if (!it.inDen && it.hit.outcome == WindowOutcome::Censored) {
            m.count = MomentCount::Censored;
        } else {
            m.count = MomentCount::NoSuccess;
        }
        if (followedBy && !it.exposure) {
            const std::string within = seconds(spec.success.withinS);
            if (it.hit.outcome == WindowOutcome::Found) {
                const Event& answer = events[it.hit.index];
                m.answerAfterS = answer.t - e.t;
                m.endT = std::max(e.t, answer.t);
                m.what += it.hit.index == it.event ? " (itself the answer)"
                                                   : " → " + eventWords(answer) + " after " + seconds(*m.answerAfterS);
                addPlayer(m.players, answer.player);
            } else if (it.hit.outcome == WindowOutcome::Censored) {
                m.what += " → the period ended within " + within +
                          (it.inDen ? " (counted as not answered)" : ": not counted");
                m.endT = std::max(e.t, match.info.periodLength(e.period));
            } else {
                m.what += " → nothing within " + within;
                m.endT = e.t + spec.success.withinS;
            }
        }
        out.push_back(std::move(m));
    }
    std::stable_sort(out.begin(), out.end(), [](const Moment& a, const Moment& b) {
        return a.period != b.period ? a.period < b.period : a.t < b.t;
    });
    return out;
}

std::string periodClock(double t) {
    const long s = std::lround(std::floor(std::max(0.0, t)));
    return twoDigits(s / 60) + ":" + twoDigits(s % 60);
}

std::string matchClock(int period, double t) {
    static constexpr double kStartMin[] = {0, 45, 90, 105};
    static constexpr double kLengthMin[] = {45, 45, 15, 15};
    if (period >= 1 && period <= 4) {
        const double start = kStartMin[period - 1] * 60, length = kLengthMin[period - 1] * 60;
        if (t < length) return periodClock(start + t);
        const long added = std::lround(std::floor(t - length));
        return std::to_string(std::lround((start + length) / 60)) + "+" + std::to_string(added / 60) +
               ":" + twoDigits(added % 60);
    }
    return periodClock(120 * 60 + t);
}

double VideoClock::at(const MatchInfo& info, int period, double t) const {
    double start = 0;
    for (int p = 1; p <= period; ++p) {
        if (auto set = periodStartS.find(p); set != periodStartS.end()) start = set->second;
        else if (p > 1) start += info.periodLength(p - 1);
    }
    return start + t;
}

std::vector<Clip> clipsOf(const MatchInfo& info, const std::vector<Moment>& moments,
                          const VideoClock& clock) {
    std::vector<std::size_t> order(moments.size());
    for (std::size_t i = 0; i < order.size(); ++i) order[i] = i;
    auto startOf = [&](std::size_t i) {
        return std::max(0.0, clock.at(info, moments[i].period, moments[i].startT) - clock.leadInS);
    };
    std::stable_sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) { return startOf(a) < startOf(b); });
    std::vector<Clip> clips;
    for (std::size_t i : order) {
        const Moment& m = moments[i];
        const double start = startOf(i);
        const double end = clock.at(info, m.period, m.endT) + clock.leadOutS;
        if (!clips.empty() && start <= clips.back().endS) {
            clips.back().endS = std::max(clips.back().endS, end);
            clips.back().moments.push_back(i);
        } else {
            clips.push_back({start, end, {i}});
        }
    }
    return clips;
}

std::string vttTime(double seconds) {
    const long ms = std::lround(std::max(0.0, seconds) * 1000);
    char buf[32];
    std::snprintf(buf, sizeof buf, "%02ld:%02ld:%02ld.%03ld", ms / 3600000, ms / 60000 % 60,
                  ms / 1000 % 60, ms % 1000);
    return buf;
}

namespace {

/// WebVTT cue text: '&', '<' and '>' escaped, no line terminators, never "-->".
std::string vttText(const std::string& text) {
    std::string out;
    for (char c : text) {
        if (c == '&') out += "&amp;";
        else if (c == '<') out += "&lt;";
        else if (c == '>') out += "&gt;";
        else if (c == '\n' || c == '\r') out += ' ';
        else out += c;
    }
    return out;
}

std::string momentLine(const Moment& m) {
    return periodName(m.period) + " " + periodClock(m.t) + " (" + matchClock(m.period, m.t) + ") · " +
           m.what;
}

} // namespace

std::string clipsWebVtt(const MatchInfo& info, const std::vector<Moment>& moments,
                        const std::vector<Clip>& clips, const std::string& title) {
    std::string out = "WEBVTT\n\nNOTE\n" + vttText(title) + "\n" + vttText(info.id + " · " + info.date +
                                                                          " · " + info.opponent) +
                      "\n\n";
    int n = 0;
    for (const Clip& c : clips) {
        out += std::to_string(++n) + "\n" + vttTime(c.startS) + " --> " + vttTime(c.endS) + "\n";
        for (std::size_t i : c.moments) out += vttText(momentLine(moments[i])) + "\n";
        out += "\n";
    }
    return out;
}

std::string clipsCsv(const MatchInfo& info, const std::vector<Moment>& moments,
                     const std::vector<Clip>& clips) {
    std::string out = "match_id,clip,start_s,end_s,start,end,period,period_clock,match_clock,zone,"
                      "counts,after_s,what,players\n";
    int n = 0;
    char buf[64];
    for (const Clip& c : clips) {
        ++n;
        for (std::size_t i : c.moments) {
            const Moment& m = moments[i];
            std::snprintf(buf, sizeof buf, "%.3f,%.3f", c.startS, c.endS);
            std::string players;
            for (const auto& p : m.players) players += (players.empty() ? "" : " ") + p;
            std::string after;
            if (m.answerAfterS) {
                char a[32];
                std::snprintf(a, sizeof a, "%.1f", *m.answerAfterS);
                after = a;
            }
            out += csvField(info.id) + "," + std::to_string(n) + "," + buf + "," + vttTime(c.startS) + "," +
                   vttTime(c.endS) + "," + std::to_string(m.period) + "," + periodClock(m.t) + "," +
                   csvField(matchClock(m.period, m.t)) + "," + zoneCode(m.band, m.lane) + "," + std::string(toString(m.count)) + "," + after + "," +
                   csvField(m.what) + "," + csvField(players) + "\n";
        }
    }
    return out;
}

} // namespace pitchloop::model
