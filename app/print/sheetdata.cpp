#include "sheetdata.h"

#include "drills.h"
#include "fixtures.h"
#include "focus.h"
#include "sessions.h"
#include "wording.h"

#include <algorithm>
#include <cmath>
#include <map>

namespace pitchloop::print {

using namespace pitchloop::model;

namespace {

std::string metricName(ClubRepository& repo, const std::string& id) {
    const auto spec = repo.metric(id);
    return spec && !spec->name.empty() ? spec->name : id;
}

} // namespace

SheetResult<SessionSheetData> sessionSheetData(ClubRepository& repo, const std::string& squad,
                                               const std::string& date) {
    SheetResult<SessionSheetData> result;
    const auto day = dayNumber(date);
    if (!day) {
        result.problem = "'" + date + "' is not a date (expected YYYY-MM-DD)";
        return result;
    }
    const auto saved = SessionStore(repo).get(squad, date);
    if (!saved) {
        result.problem = "no saved session of " + squad + " on " + date +
                         ": plan and save that day's session first";
        return result;
    }

    SessionSheetData d;
    d.club = repo.clubName();
    d.squad = saved->squad;
    d.season = saved->season;
    d.date = saved->date;
    d.dayNumber = *day;
    d.dayLabel = saved->dayLabel;
    d.cap = saved->cap;
    d.minutes = saved->minutes;
    d.players = saved->players;
    d.savedBy = saved->savedBy;
    d.savedAt = saved->savedAt;
    d.grid = repo.tallyGrid();

    const DrillBook book(repo);
    for (const SavedBlock& b : saved->blocks) {
        SheetBlock s;
        s.role = b.role;
        s.drillId = b.drillId;
        s.minutes = b.minutes;
        s.focusId = b.focusId;
        s.why = b.why;
        if (const auto drill = book.get(b.drillId)) {
            s.title = drill->title;
            s.intensity = drill->intensity;
            s.organisation = drill->organisation;
            s.coachingPoints = drill->coachingPoints;
        } else {
            s.drillFound = false;
            s.title = "drill " + std::to_string(b.drillId) + " (no longer in the drill book)";
        }
        d.minutesInBlocks += b.minutes;
        d.blocks.push_back(std::move(s));
    }

    const FocusStore focuses(repo);
    for (const auto& [id, minutes] : saved->focusMinutes) {
        SheetFocus f;
        f.id = id;
        f.minutes = minutes;
        if (const auto focus = focuses.get(id)) {
            f.metric = focus->metric;
            f.metricName = metricName(repo, focus->metric);
            f.note = focus->note;
            // The sketch is drawn on the club's grid; a focus from an earlier grid is shown
            // on the zones its own fall in (as the planner reads it).
            f.zones = focus->grid == d.grid ? focus->zones : mapZones(focus->zones, focus->grid, d.grid);
        } else {
            f.metric = f.metricName = "focus " + std::to_string(id) + " (removed)";
        }
        (minutes > 0 ? d.focuses : d.focusesNotMet).push_back(std::move(f));
    }
    for (std::size_t i = 0; i < d.focuses.size(); ++i)
        d.focuses[i].label = "F" + std::to_string(i + 1);
    result.data = std::move(d);
    return result;
}

namespace {

DebriefMark mark(const DebriefItem& item, const std::map<std::string, MetricSpec>& specs,
                 const ZoneGrid& grid, bool window, bool hasPrevious) {
    const ZoneStatus& s = item.now;
    DebriefMark m;
    m.metric = s.metric;
    if (const auto it = specs.find(s.metric); it != specs.end()) {
        m.metricName = it->second.name.empty() ? s.metric : it->second.name;
        m.question = it->second.question;
        m.kind = it->second.kind();
        m.sentence = s.state == FlagState::TooLittleData && !std::isnan(s.matchTail)
                         ? words::unusualMatchSentence(it->second, s, grid)
                         : words::coachSentence(it->second, s, grid);
    } else {
        m.metricName = s.metric;
    }
    m.band = s.band;
    m.lane = s.lane;
    m.value = s.value;
    m.low = s.interval.low;
    m.high = s.interval.high;
    m.level = s.level;
    if (s.target) {
        m.direction = s.target->direction;
        m.target = s.target->value;
    }
    m.pMiss = s.pMiss;
    m.sample = s.sum.den;
    m.matches = s.sum.matches;
    m.gap = item.gap;
    m.before = item.before;
    m.isNew = window && hasPrevious && item.before != FlagState::OffTarget;
    return m;
}

} // namespace

SheetResult<DebriefSheetData> debriefSheetData(ClubRepository& repo, const std::string& matchId) {
    SheetResult<DebriefSheetData> result;
    const auto summary = repo.matchSummary(matchId);
    const auto where = repo.seasonOfMatch(matchId);
    if (!summary || !where) {
        result.problem = "no match '" + matchId + "' in the club file";
        return result;
    }
    DebriefSheetData d;
    d.club = repo.clubName();
    d.matchId = summary->id;
    d.date = summary->date;
    d.opponent = summary->opponent;
    d.venue = summary->venue;
    d.competition = summary->competition;
    d.goalsUs = summary->goalsUs;
    d.goalsOpp = summary->goalsOpp;
    d.squad = where->first;
    d.season = where->second;
    d.pitch = summary->pitch;
    d.grid = repo.tallyGrid();

    const SeasonTallies tallies = repo.seasonTallies(d.squad, d.season);
    const auto at = std::find(tallies.matchIds.begin(), tallies.matchIds.end(), matchId);
    if (at == tallies.matchIds.end()) {
        result.problem =
            "match '" + matchId + "' has no stored tallies in " + d.squad + " " + d.season;
        return result;
    }
    const auto focal = static_cast<std::size_t>(at - tallies.matchIds.begin());
    d.matchNumber = static_cast<int>(focal) + 1;
    d.seasonMatches = static_cast<int>(tallies.matchIds.size());

    const FlagSettings settings = repo.flagSettings();
    d.window = settings.window;
    d.level = settings.level;
    d.offThreshold = settings.offThreshold;
    d.fdr = settings.fdr;
    d.fdrQ = settings.fdrQ;
    std::size_t first = 0;
    if (settings.window.kind == Window::Kind::Match)
        first = focal;
    else if (settings.window.kind == Window::Kind::LastN && settings.window.n > 0)
        first = focal + 1 > static_cast<std::size_t>(settings.window.n)
                    ? focal + 1 - static_cast<std::size_t>(settings.window.n)
                    : 0;
    d.windowFirstMatch = tallies.matchIds[first];

    const auto targets = repo.targets(d.squad, d.season);
    d.hasTargets = !targets.empty();
    if (d.hasTargets) {
        const auto metrics = repo.metrics();
        std::map<std::string, MetricSpec> specs;
        for (const auto& m : metrics)
            specs[m.id] = m;
        const Debrief debrief = buildDebrief(tallies, focal, metrics, targets, d.grid, settings);
        d.previousMatchId = debrief.previousMatchId;
        const bool hasPrevious = !debrief.previousMatchId.empty();
        for (const auto& item : debrief.slippedInWindow)
            d.slippedInWindow.push_back(mark(item, specs, d.grid, true, hasPrevious));
        for (const auto& item : debrief.slippedInMatch)
            d.slippedInMatch.push_back(mark(item, specs, d.grid, false, hasPrevious));
        for (const auto& item : debrief.recovered)
            d.recovered.push_back(mark(item, specs, d.grid, false, hasPrevious));
        for (const auto& item : debrief.watched)
            d.watched.push_back(mark(item, specs, d.grid, false, hasPrevious));
        for (const auto& item : debrief.unusualInMatch)
            d.unusualInMatch.push_back(mark(item, specs, d.grid, false, hasPrevious));
        d.judged = debrief.judged;
        d.tooLittleData = debrief.tooLittleData;
        d.chanceFlags = debrief.seasonChanceFlags;
        d.offThreshold = debrief.offThreshold;
    } else if (focal > 0) {
        d.previousMatchId = tallies.matchIds[focal - 1];
    }
    result.data = std::move(d);
    return result;
}

} // namespace pitchloop::print
