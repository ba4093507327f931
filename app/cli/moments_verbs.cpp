#include "moments_verbs.h"

#include "commands.h"
#include "exports.h"
#include "format.h"
#include "moments.h"
#include "wording.h"
#include "zonenames.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cstdio>
#include <limits>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

std::string countWord(MomentCount c) {
    switch (c) {
    case MomentCount::Success: return "yes";
    case MomentCount::NoSuccess: return "no";
    case MomentCount::Censored: return "not counted";
    case MomentCount::Exposure: return "exposure";
    }
    return "";
}

std::string shortPeriod(int period) {
    switch (period) {
    case 1: return "1st";
    case 2: return "2nd";
    default: return "p" + std::to_string(period);
    }
}

} // namespace

MomentVerbs::MomentVerbs(CLI::App& app) {
    auto request = [&](CLI::App* sub) {
        sub->add_option("match", m_match, "The match (the window ends with it)")->required();
        sub->add_option("--metric", m_metric, "Metric id")->required();
        sub->add_option("--zone", m_zone, "Zone BAND,LANE (0,0 or none: the whole pitch)");
        sub->add_option("--window", m_window, "match, lastN or season")->capture_default_str();
        sub->add_option("--player", m_player, "Only moments involving this player of ours (shirt number)");
        sub->add_option("--unit", m_unit, "Only moments involving a player of ours in this unit: goalkeeper, "
                                          "defence, midfield, attack, left_side, right_side or centre "
                                          "(positions from the squad list)");
    };
    m_list = app.add_subcommand("moments", "The losses, passes and actions behind a zone's number, "
                                           "with the match clock (docs/moments.md)");
    request(m_list);
    m_list->add_option("--format", m_format, "table, csv or json")
        ->capture_default_str()
        ->check(CLI::IsMember({"table", "csv", "json"}));

    CLI::App* exportGroup = app.get_subcommand("export");
    m_clips = exportGroup->add_subcommand("clips", "The moments behind a zone as a clip list for a "
                                                   "video player: WebVTT chapters or CSV");
    request(m_clips);
    m_clips->add_option("--format", m_clipFormat, "vtt (WebVTT chapters) or csv")
        ->capture_default_str()
        ->check(CLI::IsMember({"vtt", "csv"}));
    m_clips->add_option("--lead-in", m_leadIn, "Seconds of video before each moment")
        ->capture_default_str()
        ->check(CLI::Range(0.0, 600.0));
    m_clips->add_option("--lead-out", m_leadOut, "Seconds of video after each moment")
        ->capture_default_str()
        ->check(CLI::Range(0.0, 600.0));
    m_clips->add_option("--period-start", m_periodStarts,
                        "Where a period starts in the video, PERIOD=[hh:]mm:ss (repeatable; remembered "
                        "for the match; default: as last given, else the 1st at 0:00 and each next one "
                        "right after the one before)");
    m_clips->add_option("-o,--out", m_out, "The file to write; - for standard output")->required();
}

int MomentVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    return m_list->parsed() ? runList(*repo, out, err) : runClips(*repo, out, err);
}

namespace {

std::optional<MomentsResult> findMoments(ClubRepository& repo, const std::string& match,
                                         const std::string& metric, const std::string& zoneText,
                                         const std::string& windowText, const std::string& player,
                                         const std::string& unit, std::ostream& err) {
    MomentsRequest request;
    if (!player.empty()) request.player = player;
    if (!unit.empty()) {
        request.unit = unitFromString(unit);
        if (!request.unit) {
            err << "error: --unit '" << unit
                << "': expected goalkeeper, defence, midfield, attack, left_side, right_side or centre\n";
            return std::nullopt;
        }
    }
    request.matchId = match;
    request.metricId = metric;
    if (!zoneText.empty() && zoneText != "0,0") {
        request.zone = parseZone(zoneText);
        if (!request.zone) {
            err << "error: --zone '" << zoneText << "': expected BAND,LANE, e.g. 2,5 (0,0: the whole pitch)\n";
            return std::nullopt;
        }
    }
    const auto window = Window::parse(windowText);
    if (!window) {
        err << "error: --window '" << windowText << "': expected match, lastN or season\n";
        return std::nullopt;
    }
    request.window = *window;
    auto result = storedMoments(repo, request);
    if (!result.problem.empty()) {
        err << "error: " << result.problem;
        if (result.problem.rfind("no match", 0) == 0) err << " (see: pitchloop matches)";
        if (result.problem.rfind("no metric", 0) == 0) err << " (see: pitchloop metrics list)";
        err << "\n";
        return std::nullopt;
    }
    return result;
}

} // namespace

int MomentVerbs::runList(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto found = findMoments(repo, m_match, m_metric, m_zone, m_window, m_player, m_unit, err);
    if (!found) return kExitBadInput;
    const auto& moments = found->moments;
    if (m_format == "csv") {
        out << momentsCsv(moments);
        return kExitOk;
    }
    const ZoneGrid grid = repo.tallyGrid();
    const auto zone = parseZone(m_zone);
    const int band = zone ? zone->band : 0, lane = zone ? zone->lane : 0;
    const auto metrics = repo.metrics();
    const MetricSpec& metric = *std::find_if(metrics.begin(), metrics.end(),
                                             [&](const MetricSpec& m) { return m.id == m_metric; });
    if (m_format == "json") {
        nlohmann::json j;
        j["match_id"] = m_match;
        j["metric"] = m_metric;
        j["band"] = band;
        j["lane"] = lane;
        j["window"] = Window::parse(m_window)->name();
        j["matches"] = nlohmann::json::array();
        for (const auto& s : found->matches) j["matches"].push_back(s.id);
        j["num"] = found->num;
        j["all_moments"] = found->allMoments;
        j["den"] = found->den;
        j["moments"] = nlohmann::json::array();
        for (const Moment& m : moments) j["moments"].push_back(toJson(m));
        out << j.dump(2) << "\n";
        return kExitOk;
    }
    const Window window = *Window::parse(m_window);
    out << (metric.name.empty() ? metric.id : metric.name) << " · " << zoneName(band, lane, grid) << " · "
        << words::windowName(window) << " (" << found->matches.size()
        << (found->matches.size() == 1 ? " match" : " matches") << " to " << m_match << ")\n";
    const double value = found->den > 0 ? static_cast<double>(found->num) / static_cast<double>(found->den)
                                        : std::numeric_limits<double>::quiet_NaN();
    out << found->allMoments << (found->allMoments == 1 ? " moment" : " moments") << "; the number from them: "
        << found->num << " / " << found->den
        << (metric.per == MetricSpec::Per::Match ? (found->den == 1 ? " match" : " matches") : "") << " = "
        << formatValue(metric.kind(), value) << "\n";
    if (!m_player.empty() || !m_unit.empty())
        out << moments.size() << " of them involve "
            << (m_unit.empty() ? "player " + m_player : unitWords(*unitFromString(m_unit))) << "\n";
    if (moments.empty()) return kExitOk;
    out << "\n";
    char line[160];
    std::snprintf(line, sizeof line, "%-12s %-18s %-7s %-12s %s\n", "match", "clock", "zone", "counts", "what");
    out << line;
    for (const Moment& m : moments) {
        const std::string clock = shortPeriod(m.period) + " " + periodClock(m.t) + " (" + matchClock(m.period, m.t) + ")";
        std::snprintf(line, sizeof line, "%-12s %-18s ", m.matchId.c_str(), clock.c_str());
        out << line << padColumn(zoneCode(m.band, m.lane), 8) << padColumn(countWord(m.count), 13) << m.what << "\n";
    }
    return kExitOk;
}

int MomentVerbs::runClips(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    VideoClock clock;
    clock.leadInS = m_leadIn;
    clock.leadOutS = m_leadOut;
    for (const auto& text : m_periodStarts) {
        const auto eq = text.find('=');
        std::optional<double> at;
        int period = 0;
        if (eq != std::string::npos) {
            try {
                std::size_t used = 0;
                period = std::stoi(text.substr(0, eq), &used);
                if (used != eq) period = 0;
            } catch (const std::exception&) {
                period = 0;
            }
            at = parseClock(text.substr(eq + 1));
        }
        if (period < 1 || !at) {
            err << "error: --period-start '" << text << "': expected PERIOD=[hh:]mm:ss, e.g. 2=47:30\n";
            return kExitBadInput;
        }
        clock.periodStartS[period] = *at;
    }
    const auto found = findMoments(repo, m_match, m_metric, m_zone, m_window, m_player, m_unit, err);
    if (!found) return kExitBadInput;
    // Period starts given are remembered for the match; without them, the remembered ones apply.
    const bool given = !m_periodStarts.empty();
    if (!given) clock.periodStartS = repo.videoPeriodStarts(m_match);
    if (found->matches.size() != 1) {
        err << "error: --window " << m_window << ": a clip list describes one match's video, and this window has "
            << found->matches.size() << " matches; use --window match (the default) for each match\n";
        return kExitBadInput;
    }
    const auto match = repo.loadMatch(m_match);
    const auto clips = clipsOf(match->info, found->moments, clock);
    const auto metrics = repo.metrics();
    const MetricSpec& metric = *std::find_if(metrics.begin(), metrics.end(),
                                             [&](const MetricSpec& m) { return m.id == m_metric; });
    const auto zone = parseZone(m_zone);
    const std::string title = (metric.name.empty() ? metric.id : metric.name) + " · " +
                              zoneName(zone ? zone->band : 0, zone ? zone->lane : 0, repo.tallyGrid());
    const std::string bytes = m_clipFormat == "vtt" ? clipsWebVtt(match->info, found->moments, clips, title)
                                                    : clipsCsv(match->info, found->moments, clips);
    const int code = deliverFile(m_out, bytes,
                                 std::to_string(clips.size()) + (clips.size() == 1 ? " clip" : " clips") + " of " +
                                     std::to_string(found->moments.size()) +
                                     (found->moments.size() == 1 ? " moment" : " moments"),
                                 out, err);
    if (code == kExitOk && given) repo.saveVideoPeriodStarts(m_match, clock.periodStartS);
    return code;
}

} // namespace pitchloop::cli
