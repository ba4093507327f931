#include "layoutassistant.h"

#include "appclock.h"
#include "clubsession.h"
#include "display.h"
#include "layoutdraft.h"
#include "matchreader.h"
#include "profilestore.h"
#include "repository.h"

#include <QFile>
#include <QFileInfo>
#include <QLocale>

#include <algorithm>
#include <exception>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString q(const std::string& s) { return QString::fromStdString(s); }
std::string s(const QString& q) { return q.toStdString(); }

QString roleText(const std::string& role) {
    static const std::map<std::string, const char*> texts{
        {"period", QT_TRANSLATE_NOOP("LayoutAssistant", "Period (half)")},
        {"time", QT_TRANSLATE_NOOP("LayoutAssistant", "Time")},
        {"side", QT_TRANSLATE_NOOP("LayoutAssistant", "Team (us or them)")},
        {"player", QT_TRANSLATE_NOOP("LayoutAssistant", "Player")},
        {"type", QT_TRANSLATE_NOOP("LayoutAssistant", "What happened (event)")},
        {"result", QT_TRANSLATE_NOOP("LayoutAssistant", "How it ended (result)")},
        {"x", QT_TRANSLATE_NOOP("LayoutAssistant", "Position along the pitch")},
        {"y", QT_TRANSLATE_NOOP("LayoutAssistant", "Position across the pitch")},
        {"to_x", QT_TRANSLATE_NOOP("LayoutAssistant", "End position along")},
        {"to_y", QT_TRANSLATE_NOOP("LayoutAssistant", "End position across")},
        {"zone", QT_TRANSLATE_NOOP("LayoutAssistant", "Zone (a label, no positions)")},
        {"to_zone", QT_TRANSLATE_NOOP("LayoutAssistant", "End zone (a label)")},
        {"tags", QT_TRANSLATE_NOOP("LayoutAssistant", "Tags")},
        {"match.id", QT_TRANSLATE_NOOP("LayoutAssistant", "Match (one table, many matches)")},
        {"match.date", QT_TRANSLATE_NOOP("LayoutAssistant", "Match date")},
        {"match.opponent", QT_TRANSLATE_NOOP("LayoutAssistant", "Opponent")},
        {"match.venue", QT_TRANSLATE_NOOP("LayoutAssistant", "Home or away")},
    };
    const auto it = texts.find(role);
    return it == texts.end() ? q(role) : LayoutAssistant::tr(it->second);
}

QString fieldText(const std::string& field) {
    if (field == "side") return LayoutAssistant::tr("team");
    if (field == "type") return LayoutAssistant::tr("event");
    if (field == "result") return LayoutAssistant::tr("result");
    if (field == "zone") return LayoutAssistant::tr("zone");
    if (field == "to_zone") return LayoutAssistant::tr("end zone");
    return LayoutAssistant::tr("period");
}

/// A choice of ours in plain words: "shot/stopped" → "shot · stopped".
QString oursText(const std::string& field, const std::string& ours) {
    if (ours.empty()) return LayoutAssistant::tr("— not mapped —");
    if (field == "side") return ours == "us" ? LayoutAssistant::tr("us") : LayoutAssistant::tr("them");
    if (ours == "skip") return LayoutAssistant::tr("leave out (not an event)");
    if (field == "period") return LayoutAssistant::tr("period %1").arg(q(ours));
    if (field == "zone" || field == "to_zone") {
        const auto parts = q(ours).split(QLatin1Char(','));
        return LayoutAssistant::tr("B%1·L%2").arg(parts.value(0), parts.value(1));
    }
    QString text = q(ours);
    text.replace(QLatin1Char('/'), QStringLiteral(" · "));
    text.replace(QLatin1Char('_'), QLatin1Char(' '));
    return text;
}

QVariantMap choice(const QString& id, const QString& text) {
    return {{QStringLiteral("id"), id}, {QStringLiteral("text"), text}};
}

QString localPath(const QString& pathOrUrl) {
    const QUrl url(pathOrUrl);
    return url.isLocalFile() ? url.toLocalFile() : pathOrUrl;
}

QStringList described(const Problems& problems, const std::string& file) {
    QStringList out;
    for (Problem p : problems) {
        p.file = file;
        out << q(p.describe());
    }
    return out;
}

} // namespace

struct LayoutAssistant::State {
    std::string bytes;
    Table table;
    MappingProfile profile;
    MatchDetails details;
    bool open = false;
};

LayoutAssistant::LayoutAssistant(QObject* parent) : SessionClient(parent), m_state(std::make_unique<State>()) {}
LayoutAssistant::~LayoutAssistant() = default;

bool LayoutAssistant::active() const { return m_state->open; }
QString LayoutAssistant::fileName() const { return QFileInfo(m_path).fileName(); }

QString LayoutAssistant::tableText() const {
    if (!m_state->open) return {};
    const MappingProfile& p = m_state->profile;
    QStringList parts;
    parts << tr("%1 rows").arg(QLocale().toString(static_cast<qlonglong>(m_state->table.rows.size())))
          << tr("%1 columns").arg(m_state->table.columns.size());
    switch (p.table.layout) {
    case TableLayout::JsonArray: parts << tr("a JSON array of rows"); break;
    case TableLayout::JsonLines: parts << tr("one JSON object a line"); break;
    case TableLayout::Delimited:
        parts << (p.table.delimiter == ';'    ? tr("semicolons")
                  : p.table.delimiter == '\t' ? tr("tabs")
                  : p.table.delimiter == '|'  ? tr("bars")
                                              : tr("commas"));
        if (!p.table.header) parts << tr("no header row");
        break;
    }
    if (p.decimal == ',') parts << tr("decimal comma");
    parts << (p.encoding == TextEncoding::Utf8 ? QStringLiteral("UTF-8")
              : p.encoding == TextEncoding::Latin1 ? QStringLiteral("Latin-1")
                                                   : QStringLiteral("Windows-1252"));
    return parts.join(QStringLiteral(" · "));
}

QString LayoutAssistant::delimiter() const {
    const char c = m_state->profile.table.delimiter;
    return c == '\t' ? QStringLiteral("tab") : QString(QLatin1Char(c));
}
void LayoutAssistant::setDelimiter(const QString& text) {
    const char c = text == QLatin1String("tab") ? '\t' : text.isEmpty() ? ',' : text.at(0).toLatin1();
    if (c == m_state->profile.table.delimiter) return;
    m_state->profile.table.delimiter = c;
    reread();
}
bool LayoutAssistant::header() const { return m_state->profile.table.header; }
void LayoutAssistant::setHeader(bool h) {
    if (h == m_state->profile.table.header) return;
    m_state->profile.table.header = h;
    reread();
}
QString LayoutAssistant::encoding() const { return q(std::string(toString(m_state->profile.encoding))); }
void LayoutAssistant::setEncoding(const QString& e) {
    const auto enc = encodingFromString(s(e));
    if (!enc || *enc == m_state->profile.encoding) return;
    m_state->profile.encoding = *enc;
    reread();
}
bool LayoutAssistant::decimalComma() const { return m_state->profile.decimal == ','; }
void LayoutAssistant::setDecimalComma(bool on) {
    if (on == decimalComma()) return;
    m_state->profile.decimal = on ? ',' : '.';
    recompute();
}
bool LayoutAssistant::delimited() const { return m_state->profile.table.layout == TableLayout::Delimited; }

QVariantList LayoutAssistant::columns() const {
    QVariantList out;
    if (!m_state->open) return out;
    const auto& roles = columnRoles();
    for (const ColumnLook& look : lookAtColumns(m_state->table, m_state->profile.decimal)) {
        QStringList samples;
        for (const auto& v : look.samples) samples << q(v);
        const std::string role = roleOf(m_state->profile, look.name);
        const auto at = std::find(roles.begin(), roles.end(), role);
        out << QVariantMap{{QStringLiteral("name"), q(look.name)},
                           {QStringLiteral("samples"), samples.join(QStringLiteral(" · "))},
                           {QStringLiteral("role"), q(role)},
                           // In roleChoices: 0 is "not used".
                           {QStringLiteral("roleIndex"), at == roles.end() ? 0 : static_cast<int>(at - roles.begin()) + 1}};
    }
    return out;
}

QVariantList LayoutAssistant::roleChoices() const {
    QVariantList out{choice({}, tr("— not used —"))};
    for (const auto& role : columnRoles()) out << choice(q(role), roleText(role));
    return out;
}

QString LayoutAssistant::timeForm() const {
    switch (m_state->profile.timeForm) {
    case MappingProfile::TimeForm::Clock: return QStringLiteral("clock");
    case MappingProfile::TimeForm::Frames: return QStringLiteral("frames");
    case MappingProfile::TimeForm::Seconds: break;
    }
    return QStringLiteral("seconds");
}
void LayoutAssistant::setTimeForm(const QString& f) {
    m_state->profile.timeForm = f == QLatin1String("clock")    ? MappingProfile::TimeForm::Clock
                                : f == QLatin1String("frames") ? MappingProfile::TimeForm::Frames
                                                               : MappingProfile::TimeForm::Seconds;
    recompute();
}
double LayoutAssistant::fps() const { return m_state->profile.fps; }
void LayoutAssistant::setFps(double fps) {
    if (fps <= 0 || fps == m_state->profile.fps) return;
    m_state->profile.fps = fps;
    recompute();
}
bool LayoutAssistant::timeFromKickoff() const { return m_state->profile.timeFromKickoff; }
void LayoutAssistant::setTimeFromKickoff(bool on) {
    if (on == m_state->profile.timeFromKickoff) return;
    m_state->profile.timeFromKickoff = on;
    recompute();
}
double LayoutAssistant::extentWidth() const { return m_state->profile.width; }
void LayoutAssistant::setExtentWidth(double w) {
    if (w <= 0 || w == m_state->profile.width) return;
    m_state->profile.width = w;
    recompute();
}
double LayoutAssistant::extentHeight() const { return m_state->profile.height; }
void LayoutAssistant::setExtentHeight(double h) {
    if (h <= 0 || h == m_state->profile.height) return;
    m_state->profile.height = h;
    recompute();
}
bool LayoutAssistant::byZone() const { return m_state->profile.zoneGrid.has_value(); }
QString LayoutAssistant::zoneGrid() const {
    const auto& g = m_state->profile.zoneGrid;
    return g ? q(g->name()) : QString();
}
void LayoutAssistant::setZoneGrid(const QString& name) {
    MappingProfile& p = m_state->profile;
    const auto grid = ZoneGrid::parse(s(name.trimmed()));
    if (!p.zoneGrid || !grid || *grid == *p.zoneGrid) {
        emit changed(); // an unreadable grid name snaps back to the one in use
        return;
    }
    p.zoneGrid = *grid;
    recompute();
}
QString LayoutAssistant::zonePattern() const { return q(m_state->profile.zonePattern); }
void LayoutAssistant::setZonePattern(const QString& pattern) {
    if (s(pattern.trimmed()) == m_state->profile.zonePattern) return;
    m_state->profile.zonePattern = s(pattern.trimmed());
    recompute();
}

QString LayoutAssistant::origin() const { return q(m_state->profile.origin); }
void LayoutAssistant::setOrigin(const QString& o) {
    MappingProfile& p = m_state->profile;
    if (s(o) == p.origin) return;
    p.origin = s(o);
    // From a corner the direction of y follows it; from the centre it is the person's choice.
    if (o.startsWith(QLatin1String("top"))) p.yUp = false;
    if (o.startsWith(QLatin1String("bottom"))) p.yUp = true;
    recompute();
}
bool LayoutAssistant::yDown() const { return !m_state->profile.yUp; }
void LayoutAssistant::setYDown(bool down) {
    if (down == !m_state->profile.yUp) return;
    m_state->profile.yUp = !down;
    recompute();
}
QString LayoutAssistant::frame() const { return q(m_state->profile.frame); }
void LayoutAssistant::setFrame(const QString& f) {
    MappingProfile& p = m_state->profile;
    if (s(f) == p.frame) return;
    p.frame = s(f);
    if (p.frame == "ground" && p.usAttack.empty()) setFirstHalfTowardsZero(false);
    recompute();
}
bool LayoutAssistant::firstHalfTowardsZero() const {
    const auto it = m_state->profile.usAttack.find("1");
    return it != m_state->profile.usAttack.end() && it->second == "-x";
}
void LayoutAssistant::setFirstHalfTowardsZero(bool towardsZero) {
    const std::string odd = towardsZero ? "-x" : "+x", even = towardsZero ? "+x" : "-x";
    m_state->profile.usAttack = {{"1", odd}, {"2", even}, {"3", odd}, {"4", even}};
    recompute();
}

QString LayoutAssistant::detail(const char* key) const {
    const auto& v = m_state->details.values;
    const auto it = v.find(key);
    return it == v.end() ? QString() : q(it->second);
}
void LayoutAssistant::setDetail(const char* key, const QString& value) {
    auto& v = m_state->details.values;
    const std::string text = s(value.trimmed());
    if (text.empty()) v.erase(key);
    else v[key] = text;
    recompute();
}
QString LayoutAssistant::fileNamePattern() const { return q(m_state->profile.fileNamePattern); }
void LayoutAssistant::setFileNamePattern(const QString& pattern) {
    if (s(pattern.trimmed()) == m_state->profile.fileNamePattern) return;
    m_state->profile.fileNamePattern = s(pattern.trimmed());
    recompute();
}
void LayoutAssistant::setLayoutName(const QString& name) {
    if (name == m_name) return;
    m_name = name;
    m_savedText.clear();
    emit changed();
}

bool LayoutAssistant::open(const QString& pathOrUrl) {
    m_path = localPath(pathOrUrl);
    m_savedText.clear();
    m_state->details = {};
    try {
        m_state->bytes = readFileBytes(QFile::encodeName(m_path).toStdString());
    } catch (const std::exception&) {
        m_state->open = false;
        m_problems = {tr("%1 cannot be read.").arg(fileName())};
        emit changed();
        return false;
    }
    const TableGuess guess = guessTableFormat(m_state->bytes);
    const TableResult t = parseTable(decodeText(m_state->bytes, guess.encoding, s(fileName())).text,
                                     guess.format, s(fileName()));
    const std::string club = session() ? s(session()->clubName()) : std::string();
    m_state->profile = draftProfile(t.table, guess, club);
    if (!club.empty()) m_state->profile.match["us"] = club;
    m_name = QFileInfo(m_path).completeBaseName();
    m_state->open = true;
    reread();
    return true;
}

bool LayoutAssistant::openWithLayout(const QString& pathOrUrl, const QString& layoutName) {
    ClubSession* cs = session();
    ClubRepository* repo = cs && cs->isOpen() ? cs->repository() : nullptr;
    if (!repo) return false;
    const auto saved = ProfileStore(*repo).get(s(layoutName));
    if (!saved) return false;
    const ProfileResult parsed = parseProfile(saved->text, saved->name);
    if (!parsed.profile || !open(pathOrUrl)) return false;
    m_state->profile = *parsed.profile;
    m_name = layoutName;
    reread();
    return true;
}

void LayoutAssistant::close() {
    m_state = std::make_unique<State>();
    m_path.clear();
    m_words.clear();
    m_points.clear();
    m_problems.clear();
    m_warnings.clear();
    m_previewText.clear();
    m_ready = false;
    emit changed();
}

void LayoutAssistant::setRole(const QString& column, const QString& role) {
    assignRole(m_state->profile, s(column), s(role));
    // A new time column: its values say which time form it is.
    if (role == QLatin1String("time"))
        for (const ColumnLook& look : lookAtColumns(m_state->table, m_state->profile.decimal))
            if (look.name == s(column))
                m_state->profile.timeForm = look.clock ? MappingProfile::TimeForm::Clock : m_state->profile.timeForm;
    recompute();
}

namespace {

/// The meanings a word of `field` can take, in the order wordChoices lists them after "".
std::vector<std::string> meaningsOf(const std::string& field, const MappingProfile& p) {
    if (field == "zone" || field == "to_zone") {
        std::vector<std::string> ids;
        const ZoneGrid grid = p.zoneGrid.value_or(ZoneGrid{});
        for (int b = 1; b <= grid.bands(); ++b)
            for (int l = 1; l <= grid.lanes(); ++l) ids.push_back(std::to_string(b) + "," + std::to_string(l));
        return ids;
    }
    if (field == "side") return {"us", "opp"};
    if (field == "type") return typeChoices();
    if (field == "result") {
        std::vector<std::string> ids;
        for (Result r : {Result::Ok, Result::Fail, Result::Goal, Result::Saved, Result::Blocked, Result::Off, Result::Post})
            ids.emplace_back(wordOf(r, 2));
        return ids;
    }
    return {"1", "2", "3", "4"};
}

} // namespace

QVariantList LayoutAssistant::wordChoices(const QString& field) const {
    QVariantList out{choice({}, oursText(s(field), {}))};
    for (const auto& id : meaningsOf(s(field), m_state->profile)) out << choice(q(id), oursText(s(field), id));
    return out;
}

void LayoutAssistant::setWord(const QString& field, const QString& word, const QString& ours) {
    if (mapWord(m_state->profile, s(field), s(word), s(ours))) recompute();
}

bool LayoutAssistant::save() {
    ClubSession* cs = session();
    ClubRepository* repo = cs && cs->isOpen() ? cs->repository() : nullptr;
    if (!repo || !m_state->open) return false;
    if (m_name.trimmed().isEmpty()) {
        m_savedText = tr("Give the layout a name first.");
        emit changed();
        return false;
    }
    if (!m_ready) {
        m_savedText = tr("Not saved yet: the file does not load with this layout (see the problems).");
        emit changed();
        return false;
    }
    MappingProfile p = m_state->profile;
    p.name = s(m_name.trimmed());
    try {
        const Problems problems = ProfileStore(*repo).save(p.name, toJson(p).dump(2), {}, nowUtcIso());
        if (!problems.empty()) {
            m_savedText = tr("Not saved: %1").arg(q(describeAll(problems)));
            emit changed();
            return false;
        }
    } catch (const std::exception& e) {
        m_savedText = tr("Not saved: %1").arg(QString::fromUtf8(e.what()));
        emit changed();
        return false;
    }
    m_savedText = tr("Saved the layout “%1”. Tables with its columns now load when dropped here.").arg(m_name.trimmed());
    emit changed();
    emit saved(m_path, loadDetails());
    return true;
}

QVariantMap LayoutAssistant::loadDetails() const {
    QVariantMap out;
    for (const auto& [k, v] : m_state->details.values) out.insert(q(k), q(v));
    return out;
}

QString LayoutAssistant::profileText() const {
    MappingProfile p = m_state->profile;
    p.name = s(m_name);
    return q(toJson(p).dump(2));
}

void LayoutAssistant::refresh() {}

void LayoutAssistant::reread() {
    const DecodedText text = decodeText(m_state->bytes, m_state->profile.encoding, s(fileName()));
    const TableResult t = parseTable(text.text, m_state->profile.table, s(fileName()));
    m_state->table = t.table;
    recompute();
}

namespace {

/// Where a word's meaning is in wordChoices (0: not mapped).
int oursIndex(const WordUse& w, const MappingProfile& p) {
    const auto ids = meaningsOf(w.field, p);
    const auto at = std::find(ids.begin(), ids.end(), w.ours);
    return at == ids.end() ? 0 : static_cast<int>(at - ids.begin()) + 1;
}

/// A problem in the app's terms: the command line's options become the form's fields.
QString inAppTerms(const Problem& p) {
    static const std::map<std::string, QString> fields{
        {"id", LayoutAssistant::tr("Match id")}, {"date", LayoutAssistant::tr("Date")},
        {"opponent", LayoutAssistant::tr("Opponent")}, {"venue", LayoutAssistant::tr("Venue")},
        {"us", LayoutAssistant::tr("Our team's name")}};
    if (p.place == "match" && p.message.rfind("not given", 0) == 0 && fields.count(p.field))
        return LayoutAssistant::tr("%1 is not given: fill it in below, or give file names a pattern that holds it.")
            .arg(fields.at(p.field));
    return q(p.describe());
}

} // namespace

void LayoutAssistant::recompute() {
    const std::string file = s(fileName());
    MappingProfile& p = m_state->profile;
    // Words, unmapped first.
    m_words.clear();
    m_unmapped = 0;
    std::vector<WordUse> words = vocabulary(m_state->table, p);
    // By field as vocabulary lists them, the unmapped words of each first.
    const auto rank = [](const WordUse& w) {
        static const std::vector<std::string> fields{"side", "type", "result", "period", "zone", "to_zone"};
        return 2 * static_cast<int>(std::find(fields.begin(), fields.end(), w.field) - fields.begin()) + !w.ours.empty();
    };
    std::stable_sort(words.begin(), words.end(), [&](const WordUse& a, const WordUse& b) { return rank(a) < rank(b); });
    for (const WordUse& w : words) {
        QStringList lines;
        for (auto l : w.lines) lines << QString::number(l);
        m_unmapped += w.ours.empty();
        m_words << QVariantMap{{QStringLiteral("field"), q(w.field)},
                               {QStringLiteral("fieldText"), fieldText(w.field)},
                               {QStringLiteral("column"), q(w.column)},
                               {QStringLiteral("word"), q(w.word)},
                               {QStringLiteral("count"), w.count},
                               {QStringLiteral("linesText"), tr("lines %1").arg(lines.join(QStringLiteral(", ")))},
                               {QStringLiteral("ours"), q(w.ours)},
                               {QStringLiteral("oursIndex"), oursIndex(w, p)}};
    }
    const DraftCheck check = checkDraft(m_state->bytes, p, m_state->details, m_path.toStdString());
    m_problems = described(check.profileErrors, s(m_name.isEmpty() ? QStringLiteral("layout") : m_name));
    // Unmapped words are listed in the words table; say how many instead of each again.
    QStringList others;
    for (Problem problem : check.errors) {
        problem.file = file;
        if (problem.message.find("is not mapped") == std::string::npos) others << inAppTerms(problem);
    }
    if (m_unmapped > 0)
        m_problems << (m_unmapped == 1 ? tr("1 word of the table is not mapped yet: see “Words”.")
                                       : tr("%1 words of the table are not mapped yet: see “Words”.").arg(m_unmapped));
    m_problems << others;
    m_warnings = described(check.warnings, file);
    m_ready = check.ready();

    m_points.clear();
    m_previewText.clear();
    m_matchText.clear();
    if (check.preview && m_ready) {
        const MatchInfo& info = check.preview->info;
        m_matchText = tr("%1 · %2 · v %3 · %4").arg(q(info.id), dateText(info.date), q(info.opponent), q(info.venue));
        if (check.matches > 1) m_matchText = tr("%1 matches, the first %2").arg(check.matches).arg(m_matchText);
    }
    if (check.preview) {
        const Match& m = *check.preview;
        const double margin = 2.5;
        int ours = 0, theirs = 0;
        for (const Event& e : m.events) {
            (e.side == Side::Us ? ours : theirs) += 1;
            if (m_points.size() >= 120) continue;
            m_points << QVariantMap{{QStringLiteral("x"), margin + e.at.x},
                                    {QStringLiteral("y"), margin + m.info.pitch.widthM - e.at.y},
                                    {QStringLiteral("us"), e.side == Side::Us},
                                    {QStringLiteral("type"), q(std::string(wordOf(e.type, 2)))}};
        }
        m_previewText = tr("First %1 of %2 events mapped so far: %3 ours (circles), %4 theirs (diamonds); we attack left to right.")
                            .arg(m_points.size())
                            .arg(ours + theirs)
                            .arg(ours)
                            .arg(theirs);
    }
    emit changed();
}

} // namespace pitchloop::desktop
