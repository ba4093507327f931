#include "calendar.h"

#include "drills.h"
#include "planner.h"
#include "repository.h"

#include <algorithm>
#include <cctype>

namespace pitchloop::model {

namespace {

constexpr std::string_view kCrlf = "\r\n";
constexpr std::size_t kFoldOctets = 75;

/// "2026-09-29" → "20260929".
std::string basicDate(const std::string& iso) {
    std::string out;
    for (char c : iso)
        if (c != '-') out += c;
    return out;
}

/// "2026-12-02T09:30:00Z" → "20261202T093000Z".
std::string basicStamp(const std::string& isoUtc) {
    std::string out;
    for (char c : isoUtc)
        if (c != '-' && c != ':') out += c;
    return out;
}

/// Minutes since midnight of "HH:MM"; the caller passes a checked time.
int minutesOfDay(const std::string& hhmm) {
    return std::stoi(hhmm.substr(0, 2)) * 60 + std::stoi(hhmm.substr(3, 2));
}

std::string localDateTime(const std::string& date, int minuteOfDay) {
    const long day = *dayNumber(date) + minuteOfDay / (24 * 60);
    const int m = minuteOfDay % (24 * 60);
    char buf[16];
    std::snprintf(buf, sizeof buf, "T%02d%02d00", m / 60, m % 60);
    return basicDate(isoDate(day)) + buf;
}

bool isContinuationByte(char c) { return (static_cast<unsigned char>(c) & 0xC0) == 0x80; }

} // namespace

std::string icalText(std::string_view text) {
    std::string out;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        switch (c) {
        case '\\': out += "\\\\"; break;
        case ';': out += "\\;"; break;
        case ',': out += "\\,"; break;
        case '\r':
            if (i + 1 < text.size() && text[i + 1] == '\n') ++i;
            out += "\\n";
            break;
        case '\n': out += "\\n"; break;
        default:
            // Other control characters are not allowed in TEXT (RFC 5545 §3.3.11).
            if (static_cast<unsigned char>(c) < 0x20 && c != '\t') break;
            out += c;
        }
    }
    return out;
}

std::string icalFold(std::string_view line) {
    std::string out;
    std::size_t limit = kFoldOctets; // the first line holds 75 octets, the others 74 + a space
    std::size_t used = 0;
    for (std::size_t i = 0; i < line.size();) {
        // One whole UTF-8 character at a time, so a fold never splits one.
        std::size_t len = 1;
        while (i + len < line.size() && isContinuationByte(line[i + len])) ++len;
        if (used + len > limit) {
            out += kCrlf;
            out += ' ';
            used = 1;
        }
        out.append(line.substr(i, len));
        used += len;
        i += len;
    }
    out += kCrlf;
    return out;
}

std::string uidSlug(std::string_view text) {
    std::string out;
    for (char c : text) {
        const auto u = static_cast<unsigned char>(c);
        if (std::isalnum(u) && u < 0x80) {
            out += static_cast<char>(std::tolower(u));
        } else if (!out.empty() && out.back() != '-') {
            out += '-';
        }
    }
    while (!out.empty() && out.back() == '-') out.pop_back();
    return out.empty() ? "club" : out;
}

std::string toICalendar(const std::vector<CalendarEvent>& events, const std::string& stampUtc,
                        const std::string& calendarName) {
    std::string out;
    auto line = [&](const std::string& text) { out += icalFold(text); };
    line("BEGIN:VCALENDAR");
    line("VERSION:2.0");
    line("PRODID:-//Pitchloop//Pitchloop training planner//EN");
    line("CALSCALE:GREGORIAN");
    line("METHOD:PUBLISH");
    line("X-WR-CALNAME:" + icalText(calendarName));
    const std::string stamp = basicStamp(stampUtc);
    for (const auto& e : events) {
        line("BEGIN:VEVENT");
        line("UID:" + e.uid);
        line("DTSTAMP:" + stamp);
        if (e.start.empty()) {
            line("DTSTART;VALUE=DATE:" + basicDate(e.date));
            line("DTEND;VALUE=DATE:" + basicDate(addDays(e.date, 1)));
            line("TRANSP:TRANSPARENT");
        } else {
            const int from = minutesOfDay(e.start);
            line("DTSTART:" + localDateTime(e.date, from));
            line("DTEND:" + localDateTime(e.date, from + std::max(e.minutes, 0)));
        }
        line("SUMMARY:" + icalText(e.summary));
        if (!e.description.empty()) line("DESCRIPTION:" + icalText(e.description));
        if (!e.categories.empty()) line("CATEGORIES:" + icalText(e.categories));
        line("END:VEVENT");
    }
    line("END:VCALENDAR");
    return out;
}

std::optional<std::string> reviewDueDate(const Focus& focus, const std::vector<Fixture>& fixtures) {
    if (!focus.reviewOn.empty()) return focus.reviewOn;
    if (focus.reviewAfterMatches <= 0 || !dayNumber(focus.startDate)) return std::nullopt;
    std::vector<std::string> dates;
    for (const auto& f : fixtures)
        if (f.date >= focus.startDate) dates.push_back(f.date);
    std::sort(dates.begin(), dates.end());
    dates.erase(std::unique(dates.begin(), dates.end()), dates.end());
    const auto n = static_cast<std::size_t>(focus.reviewAfterMatches);
    if (dates.size() < n) return std::nullopt;
    return addDays(dates[n - 1], 1);
}

CalendarEvent sessionEvent(const SavedSession& session, const std::vector<std::string>& drillTitles,
                           const std::string& start, const std::string& club) {
    CalendarEvent e;
    e.uid = "session-" + session.date + "-" + uidSlug(session.squad) + "-" + uidSlug(club) +
            "@pitchloop";
    e.date = session.date;
    e.start = start;
    e.minutes = session.minutes;
    e.summary = "Training " + session.squad + (session.dayLabel.empty() ? "" : " (" + session.dayLabel + ")");
    std::string d = session.dayLabel.empty() ? "" : session.dayLabel + ", ";
    d += std::to_string(session.minutes) + " min, " + std::to_string(session.players) +
         " players, intensity cap " + std::to_string(session.cap) + "\n";
    for (std::size_t i = 0; i < session.blocks.size(); ++i) {
        const auto& b = session.blocks[i];
        d += std::to_string(b.minutes) + " min  " + std::string(toString(b.role)) + "  " +
             (i < drillTitles.size() ? drillTitles[i] : "drill " + std::to_string(b.drillId)) +
             "\n";
    }
    d += std::string(kPlanCaution);
    e.description = d;
    e.categories = "Training";
    return e;
}

CalendarEvent reviewEvent(const Focus& focus, const std::string& dueDate,
                          const std::string& metricName, const std::string& club) {
    CalendarEvent e;
    e.uid = "review-focus-" + std::to_string(focus.id) + "-" + uidSlug(focus.squad) + "-" +
            uidSlug(club) + "@pitchloop";
    e.date = dueDate;
    e.summary = "Review focus #" + std::to_string(focus.id) + ": " + metricName;
    std::string d = focus.squad + " " + focus.season + ". Training on it since " + focus.startDate +
                    "; compare before and after, then record the verdict.";
    if (!focus.note.empty()) d += "\n" + focus.note;
    e.description = d;
    e.categories = "Review";
    return e;
}

SquadCalendar calendarFor(ClubRepository& repo, const std::string& squad,
                          const std::string& from, const std::string& to,
                          const std::string& start, const std::string& stampUtc) {
    SquadCalendar out;
    const std::string club = repo.clubName();
    std::vector<CalendarEvent> events;
    DrillBook book(repo);
    for (const SavedSession& s : SessionStore(repo).list(squad, from, to)) {
        std::vector<std::string> titles;
        for (const auto& b : s.blocks) {
            const auto d = book.get(b.drillId);
            titles.push_back(d ? d->title : "drill " + std::to_string(b.drillId));
        }
        events.push_back(sessionEvent(s, titles, start, club));
        ++out.sessions;
    }
    FixtureStore fixtures(repo);
    for (const Focus& f : FocusStore(repo).list()) {
        if (f.squad != squad || !f.closedAt.empty()) continue;
        const auto due = reviewDueDate(f, fixtures.list(f.squad, f.season));
        if (!due) {
            out.notes.push_back("focus " + std::to_string(f.id) +
                                ": the fixtures do not reach its review point yet; no review "
                                "date");
            continue;
        }
        if ((!from.empty() && *due < from) || (!to.empty() && *due > to)) continue;
        const auto metric = repo.metric(f.metric);
        events.push_back(reviewEvent(f, *due, metric ? metric->name : f.metric, club));
        ++out.reviews;
    }
    const std::string name = (club.empty() ? std::string("Pitchloop") : club) + " " + squad;
    out.text = toICalendar(events, stampUtc, name);
    return out;
}

} // namespace pitchloop::model
