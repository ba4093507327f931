#pragma once
// iCalendar (RFC 5545) files of planned sessions and focus review dates (docs/exports.md):
// text only, so any calendar program can take them in.

#include "fixtures.h"
#include "focus.h"
#include "sessions.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

class ClubRepository;

/// One entry of a calendar file.
struct CalendarEvent {
    std::string uid;         ///< stable and unique: exporting again updates the same entry
    std::string date;        ///< YYYY-MM-DD
    std::string start;       ///< "HH:MM" local (floating) time; empty for an all-day entry
    int minutes = 0;         ///< length of a timed entry
    std::string summary;     ///< the title
    std::string description; ///< may span lines
    std::string categories;  ///< one word, e.g. "Training"
};

/// A VCALENDAR with one VEVENT an entry: CRLF line ends, long lines folded at 75 octets (never
/// inside a UTF-8 character), TEXT escaped (\\, \;, \, and \n). Timed entries carry DTSTART and
/// DTEND in floating local time, all-day entries DTSTART;VALUE=DATE and the next day as DTEND.
/// `stampUtc` ("2026-12-02T09:30:00Z", as nowUtc gives it) becomes every DTSTAMP.
std::string toICalendar(const std::vector<CalendarEvent>& events, const std::string& stampUtc,
                        const std::string& calendarName);

/// A calendar TEXT value escaped as RFC 5545 §3.3.11 asks.
std::string icalText(std::string_view text);

/// A content line folded at 75 octets with CRLF + space (RFC 5545 §3.1), ended by CRLF.
std::string icalFold(std::string_view line);

/// The date a focus's review falls due: `reviewOn` when set; otherwise the day after the
/// `reviewAfterMatches`-th fixture on or after the focus's start date (its match data is in
/// by then). nullopt when the schedule does not reach that many fixtures.
std::optional<std::string> reviewDueDate(const Focus& focus, const std::vector<Fixture>& fixtures);

/// A planned session as a timed entry starting at `start` ("HH:MM") for its minutes: the
/// microcycle day and blocks in the description, the plan caution at its end.
CalendarEvent sessionEvent(const SavedSession& session, const std::vector<std::string>& drillTitles,
                           const std::string& start, const std::string& club);

/// A focus review due date as an all-day entry.
CalendarEvent reviewEvent(const Focus& focus, const std::string& dueDate,
                          const std::string& metricName, const std::string& club);

/// Lower-case letters and digits of `text`, other runs turned into one '-' (for UIDs).
std::string uidSlug(std::string_view text);

/// A squad's calendar file as the command line and the desktop app write it.
struct SquadCalendar {
    std::string text;  ///< the VCALENDAR (with no entry when there is nothing to put in it)
    int sessions = 0;  ///< saved sessions in it (its first entries)
    int reviews = 0;   ///< review due dates of open focuses in it
    std::vector<std::string> notes; ///< open focuses left out, in plain words
    bool empty() const { return sessions + reviews == 0; }
};

/// The squad's saved sessions dated `from`–`to` (inclusive; empty: open-ended) as timed entries
/// starting at `start` ("HH:MM", checked by the caller), and the review due dates of its open
/// focuses that fall in those dates as all-day entries, named after the club and squad.
/// `stampUtc` as for toICalendar.
SquadCalendar calendarFor(ClubRepository& repo, const std::string& squad,
                          const std::string& from, const std::string& to,
                          const std::string& start, const std::string& stampUtc);

} // namespace pitchloop::model
