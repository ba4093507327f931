#include "moments.h"

#include "exports.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <map>

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

/// Our players' names from the squad list, by id: "7" → "7 A. Example".
using Names = std::map<std::string, std::string, std::less<>>;

std::string playerLabel(const Event& e, const Names& names) {
    if (e.side == Side::Us)
        if (const auto it = names.find(e.player); it != names.end()) return it->second;
    return e.player;
}

/// "our pass (7)", "their shot (9), saved"; our players named when the squad list knows them.
std::string eventWords(const Event& e, const Names& names) {
    std::string s = std::string(e.side == Side::Us ? "our " : "their ") +
                    (e.type == EventType::Out ? std::string("ball out") : words(toString(e.type)));
    if (!e.player.empty()) s += " (" + playerLabel(e, names) + ")";
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
                                 std::optional<Zone> zone, const std::vector<Player>& squadList) {
    Names names;
    for (const Player& p : squadList) names[p.number] = p.number + " " + p.name;
    auto note = [&](Moment& m, const Event& e) {
        addPlayer(m.players, e.player);
        if (e.side == Side::Us && !e.player.empty() &&
            std::find(m.ours.begin(), m.ours.end(), e.player) == m.ours.end()) {
            m.ours.push_back(e.player);
            m.ourNames.push_back(playerLabel(e, names));
        }
    };
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
                     " (" + (last.player.empty() ? "" : playerLabel(last, names) + "'s ") + words(toString(last.type)) +
                     ") to " + eventWords(e, names);
            note(m, last);
            note(m, e);
            m.to = e.at;
        } else {
            m.what = eventWords(e, names);
            note(m, e);
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
                                                   : " → " + eventWords(answer, names) + " after " + seconds(*m.answerAfterS);
                note(m, answer);
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

bool involves(const Moment& m, const std::string& number) {
    return std::find(m.ours.begin(), m.ours.end(), number) != m.ours.end();
}

bool involves(const Moment& m, Unit unit, const std::vector<Player>& squadList) {
    return std::any_of(m.ours.begin(), m.ours.end(), [&](const std::string& number) {
        const auto p = std::find_if(squadList.begin(), squadList.end(), [&](const Player& x) { return x.number == number; });
        return p != squadList.end() && inUnit(p->position, unit);
    });
}

MomentsResult storedMoments(const ClubRepository& repo, const MomentsRequest& request) {
    MomentsResult out;
    const auto where = repo.seasonOfMatch(request.matchId);
    if (!where) {
        out.problem = "no match '" + request.matchId + "' in the club file";
        return out;
    }
    const auto metrics = repo.metrics();
    const auto metric = std::find_if(metrics.begin(), metrics.end(),
                                     [&](const MetricSpec& m) { return m.id == request.metricId; });
    if (metric == metrics.end()) {
        out.problem = "no metric '" + request.metricId + "'";
        return out;
    }
    if (request.window.kind == Window::Kind::Ewma) {
        out.problem = "a weighted window counts every match of the season a little, so it has no "
                      "list of moments: choose this match, the last N matches or the season";
        return out;
    }
    const ZoneGrid grid = repo.tallyGrid();
    if (const auto& z = request.zone;
        z && (z->band < 1 || z->band > grid.bands() || z->lane < 1 || z->lane > grid.lanes())) {
        out.problem = "zone " + std::to_string(z->band) + "," + std::to_string(z->lane) +
                      " is not on the club's grid (" + std::to_string(grid.bands()) + " bands × " +
                      std::to_string(grid.lanes()) + " lanes)";
        return out;
    }
    const std::vector<Player> squadList = repo.squadList(where->first);
    if (request.unit && squadList.empty()) {
        out.problem = "the squad list of " + where->first +
                      " is empty: give the players' positions to pick moments by " + unitWords(*request.unit);
        return out;
    }
    std::vector<MatchSummary> season;
    for (auto& m : repo.matches())
        if (m.squad == where->first && m.season == where->second) season.push_back(std::move(m));
    std::size_t focal = 0;
    while (focal < season.size() && season[focal].id != request.matchId) ++focal;
    const std::size_t first = windowStart(focal, request.window);
    for (std::size_t i = first; i <= focal && i < season.size(); ++i) {
        const auto match = repo.loadMatch(season[i].id);
        if (!match) continue;
        auto moments = matchMoments(*match, *metric, grid, request.zone, squadList);
        for (const Moment& m : moments) {
            if (m.count == MomentCount::Success) ++out.num;
            if (m.count == MomentCount::Exposure ||
                (metric->per == MetricSpec::Per::Items && m.count != MomentCount::Censored))
                ++out.den;
        }
        if (metric->per == MetricSpec::Per::Match && zonesKnownOn(match->info, grid)) ++out.den;
        out.allMoments += static_cast<long>(moments.size());
        std::erase_if(moments, [&](const Moment& m) {
            return (request.player && !involves(m, *request.player)) ||
                   (request.unit && !involves(m, *request.unit, squadList));
        });
        out.moments.insert(out.moments.end(), std::make_move_iterator(moments.begin()),
                           std::make_move_iterator(moments.end()));
        out.matches.push_back(season[i]);
    }
    return out;
}

std::vector<Moment> storedMomentsIn(const ClubRepository& repo, const MetricSpec& metric, const ZoneGrid& grid,
                                    const std::vector<Zone>& zones, const std::vector<std::string>& matchIds) {
    std::vector<Moment> out;
    for (const std::string& id : matchIds) {
        const auto match = repo.loadMatch(id);
        if (!match) continue;
        for (Moment& m : matchMoments(*match, metric, grid, std::nullopt))
            if (std::any_of(zones.begin(), zones.end(), [&](const Zone& z) { return z.band == m.band && z.lane == m.lane; }))
                out.push_back(std::move(m));
    }
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

namespace {

std::string decimal(double v, int places) {
    char buf[48];
    std::snprintf(buf, sizeof buf, "%.*f", places, v);
    return buf;
}

std::string namesText(const std::vector<std::string>& names) {
    std::string s;
    for (const auto& n : names) s += (s.empty() ? "" : "; ") + n;
    return s;
}

std::string playersText(const std::vector<std::string>& players) {
    std::string s;
    for (const auto& p : players) s += (s.empty() ? "" : " ") + p;
    return s;
}

} // namespace

std::string momentsCsv(const std::vector<Moment>& moments) {
    std::string out = "match_id,date,opponent,period,period_clock,match_clock,band,lane,counts,after_s,"
                      "what,players,x,y,to_x,to_y,our_players\r\n";
    for (const Moment& m : moments) {
        out += csvField(m.matchId) + "," + m.date + "," + csvField(m.opponent) + "," +
               std::to_string(m.period) + "," + periodClock(m.t) + "," + csvField(matchClock(m.period, m.t)) +
               "," + std::to_string(m.band) + "," + std::to_string(m.lane) + "," +
               std::string(toString(m.count)) + "," + (m.answerAfterS ? decimal(*m.answerAfterS, 1) : "") +
               "," + csvField(m.what) + "," +
               csvField(playersText(m.players)) + "," + decimal(m.from.x, 1) + "," + decimal(m.from.y, 1) +
               "," + (m.to ? decimal(m.to->x, 1) : "") + "," + (m.to ? decimal(m.to->y, 1) : "") + "," +
               csvField(namesText(m.ourNames)) + "\r\n";
    }
    return out;
}

std::string reviewMomentsCsv(const std::vector<Moment>& before, const std::vector<Moment>& after) {
    std::string out;
    for (const auto& [side, moments] : {std::pair{"before", &before}, std::pair{"after", &after}}) {
        const std::string csv = momentsCsv(*moments);
        std::size_t line = 0;
        bool header = true;
        while (line < csv.size()) {
            const std::size_t end = csv.find("\r\n", line);
            const std::string row = csv.substr(line, end - line);
            if (header && out.empty()) out += "side," + row + "\r\n";
            else if (!header) out += std::string(side) + "," + row + "\r\n";
            header = false;
            line = end + 2;
        }
    }
    return out;
}

nlohmann::json toJson(const Moment& m) {
    nlohmann::json j;
    j["match_id"] = m.matchId;
    j["date"] = m.date;
    j["opponent"] = m.opponent;
    j["period"] = m.period;
    j["t"] = m.t;
    j["start_t"] = m.startT;
    j["end_t"] = m.endT;
    j["period_clock"] = periodClock(m.t);
    j["match_clock"] = matchClock(m.period, m.t);
    j["band"] = m.band;
    j["lane"] = m.lane;
    j["counts"] = toString(m.count);
    j["after_s"] = m.answerAfterS ? nlohmann::json(*m.answerAfterS) : nlohmann::json();
    j["what"] = m.what;
    j["players"] = m.players;
    j["our_players"] = m.ourNames;
    j["from"] = {{"x", m.from.x}, {"y", m.from.y}};
    j["to"] = m.to ? nlohmann::json{{"x", m.to->x}, {"y", m.to->y}} : nlohmann::json();
    j["event_index"] = m.event;
    return j;
}

std::optional<double> parseClock(std::string_view text) {
    double total = 0;
    int parts = 0;
    std::size_t pos = 0;
    while (true) {
        const std::size_t colon = text.find(':', pos);
        const std::string part(text.substr(pos, colon == std::string_view::npos ? std::string_view::npos : colon - pos));
        if (part.empty() || ++parts > 3 || part.find_first_not_of("0123456789.") != std::string::npos)
            return std::nullopt;
        std::size_t used = 0;
        double v = 0;
        try {
            v = std::stod(part, &used);
        } catch (const std::exception&) {
            return std::nullopt;
        }
        if (used != part.size()) return std::nullopt;
        total = total * 60 + v;
        if (colon == std::string_view::npos) return total;
        pos = colon + 1;
    }
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
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (text.compare(i, 3, "-->") == 0) {
            out += "-&gt;";
            i += 2;
            continue;
        }
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
    std::string out = "match_id,clip,start_s,end_s,start,end,period,period_clock,match_clock,band,lane,"
                      "counts,after_s,what,players\r\n";
    int n = 0;
    char buf[64];
    for (const Clip& c : clips) {
        ++n;
        for (std::size_t i : c.moments) {
            const Moment& m = moments[i];
            std::snprintf(buf, sizeof buf, "%.3f,%.3f", c.startS, c.endS);
            const std::string players = playersText(m.players);
            const std::string after = m.answerAfterS ? decimal(*m.answerAfterS, 1) : "";
            out += csvField(info.id) + "," + std::to_string(n) + "," + buf + "," + vttTime(c.startS) + "," +
                   vttTime(c.endS) + "," + std::to_string(m.period) + "," + periodClock(m.t) + "," +
                   csvField(matchClock(m.period, m.t)) + "," + std::to_string(m.band) + "," +
                   std::to_string(m.lane) + "," + std::string(toString(m.count)) + "," + after + "," +
                   csvField(m.what) + "," + csvField(players) + "\r\n";
        }
    }
    return out;
}

} // namespace pitchloop::model
