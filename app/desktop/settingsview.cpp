#include "settingsview.h"

#include "clubsession.h"
#include "display.h"
#include "intensitycapmodel.h"
#include "repository.h"
#include "sessions.h"
#include "startup.h"

#include <QFileInfo>

#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString num(double v) { return QString::number(v, 'g', 10); }

/// "0.9" or "90%" as a number; nullopt when the text is neither.
std::optional<double> readNumber(const QString& typed) {
    QString text = typed.trimmed();
    const bool percent = text.endsWith(QLatin1Char('%'));
    if (percent) text.chop(1);
    bool ok = false;
    const double v = text.trimmed().toDouble(&ok);
    if (!ok || !std::isfinite(v)) return std::nullopt;
    return percent ? v / 100 : v;
}

bool sameFlags(const FlagSettings& a, const FlagSettings& b) {
    return a.level == b.level && a.rateInterval == b.rateInterval && a.window == b.window &&
           a.offThreshold == b.offThreshold && a.watchThreshold == b.watchThreshold &&
           a.fdr == b.fdr && a.fdrQ == b.fdrQ && a.falseFlagsPerSeason == b.falseFlagsPerSeason &&
           a.seasonMatches == b.seasonMatches && a.matchVariation == b.matchVariation;
}

QString gridDescription(const ZoneGrid& g) {
    const QString name = QString::fromStdString(g.name());
    if (g.kind() == ZoneGrid::Kind::Markings)
        return SettingsView::tr("%1 bands × 5 lanes cut at the penalty- and goal-area lines (%2)")
            .arg(g.bands())
            .arg(name);
    return SettingsView::tr("%1 bands × %2 lanes of equal size (%3)").arg(g.bands()).arg(g.lanes()).arg(name);
}

} // namespace

SettingsView::SettingsView(QObject* parent)
    : SessionClient(parent), m_caps(new IntensityCapModel(this)) {
    connect(m_caps, &QAbstractItemModel::dataChanged, this, &SettingsView::formChanged);
}

template <typename T> void SettingsView::setField(T& field, const T& value) {
    if (field == value) return;
    field = value;
    emit formChanged();
}

void SettingsView::setLevelText(const QString& t) { setField(m_form.level, t); }
void SettingsView::setIntervalMethod(int m) { setField(m_form.interval, m); }
void SettingsView::setWindowKind(int k) { setField(m_form.windowKind, k); }
void SettingsView::setWindowNText(const QString& t) { setField(m_form.windowN, t); }
void SettingsView::setLambdaText(const QString& t) { setField(m_form.lambda, t); }
void SettingsView::setOffThresholdText(const QString& t) { setField(m_form.off, t); }
void SettingsView::setWatchThresholdText(const QString& t) { setField(m_form.watch, t); }
void SettingsView::setFdr(bool on) { setField(m_form.fdr, on); }
void SettingsView::setFdrQText(const QString& t) { setField(m_form.fdrQ, t); }
void SettingsView::setBudgetText(const QString& t) { setField(m_form.budget, t); }
void SettingsView::setSeasonMatchesText(const QString& t) { setField(m_form.seasonMatches, t); }
void SettingsView::setMatchVariation(bool on) { setField(m_form.variation, on); }

bool SettingsView::edited() const {
    return !(m_form == m_loadedForm) || m_caps->texts() != m_loadedCaps;
}

QString SettingsView::levelDefault() const {
    return tr("Default %1 (a 90% interval)").arg(num(FlagSettings{}.level));
}
QString SettingsView::windowDefault() const {
    return tr("Default: %1; an EWMA's default λ is %2")
        .arg(windowPhrase(FlagSettings{}.window), num(Window{}.lambda));
}
QString SettingsView::offDefault() const { return tr("Default %1").arg(num(FlagSettings{}.offThreshold)); }
QString SettingsView::watchDefault() const { return tr("Default %1").arg(num(FlagSettings{}.watchThreshold)); }
QString SettingsView::fdrDefault() const {
    const FlagSettings defaults;
    return tr("Default %1, q = %2").arg(defaults.fdr ? tr("on") : tr("off"), num(defaults.fdrQ));
}

QString SettingsView::budgetDefault() const {
    const FlagSettings defaults;
    return tr("Default %1 a season over %2 matches, variation allowed for")
        .arg(num(defaults.falseFlagsPerSeason))
        .arg(defaults.seasonMatches);
}

QString SettingsView::undoText() const {
    return m_undo.empty() ? QString() : tr("Undo the last save (Ctrl+Z)");
}

SettingsView::Form SettingsView::formOf(const FlagSettings& f) {
    Form form;
    form.level = num(f.level);
    form.interval = f.rateInterval == IntervalMethod::Jeffreys ? 1 : 0;
    switch (f.window.kind) {
    case Window::Kind::LastN: form.windowKind = 0; break;
    case Window::Kind::Season: form.windowKind = 1; break;
    case Window::Kind::Ewma: form.windowKind = 2; break;
    case Window::Kind::Match: form.windowKind = 3; break;
    }
    form.windowN = QString::number(f.window.kind == Window::Kind::LastN ? f.window.n : Window{}.n);
    form.lambda = num(f.window.kind == Window::Kind::Ewma ? f.window.lambda : Window{}.lambda);
    form.off = num(f.offThreshold);
    form.watch = num(f.watchThreshold);
    form.fdr = f.fdr;
    form.fdrQ = num(f.fdrQ);
    form.budget = num(f.falseFlagsPerSeason);
    form.seasonMatches = QString::number(f.seasonMatches);
    form.variation = f.matchVariation;
    return form;
}

void SettingsView::refresh() {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (repo != m_repoSeen) {
        m_repoSeen = repo;
        m_undo.clear(); // an undo belongs to the club file it was saved in
        m_reloadForm = true;
    }
    if (!repo) {
        m_gridText.clear();
        m_ruleText.clear();
        emit storedChanged();
        emit resultChanged();
        return;
    }
    m_stored = {repo->flagSettings(), FixtureStore(*repo).caps()};
    m_gridText = gridDescription(repo->tallyGrid());
    const FlagSettings& f = m_stored.flags;
    const QString offRule =
        f.falseFlagsPerSeason > 0
            ? (f.falseFlagsPerSeason == 1
                   ? tr("off target when almost certain, so that about 1 false flag a season is expected across the board")
                   : tr("off target when almost certain, so that about %1 false flags a season are expected across the board")
                         .arg(num(f.falseFlagsPerSeason)))
            : tr("off target at P(miss) ≥ %1").arg(num(f.offThreshold));
    m_ruleText = tr("Now: judged over %1; %2%3; close to the line at %4; a %5 around each value; %6.")
                     .arg(windowPhrase(f.window), offRule,
                          f.fdr ? tr(" with Benjamini–Hochberg at q = %1").arg(num(f.fdrQ)) : QString(),
                          num(f.watchThreshold), desktop::levelText(f.level),
                          f.matchVariation ? tr("the usual swing from match to match allowed for")
                                           : tr("pure chance only (no match-to-match variation)"));
    // What the coach typed and has not saved stays, unless a save or undo just wrote the file.
    if (m_reloadForm || !edited()) loadForm();
    m_reloadForm = false;
    emit storedChanged();
    emit formChanged();
    emit resultChanged();
}

void SettingsView::loadForm() {
    m_form = formOf(m_stored.flags);
    m_loadedForm = m_form;
    m_caps->load(m_stored.caps);
    m_loadedCaps = m_caps->texts();
}

void SettingsView::revert() {
    loadForm();
    setResult({}, {});
    emit formChanged();
}

bool SettingsView::save() {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) {
        setResult(tr("No club file is open."), {});
        return false;
    }
    Stored current;
    try {
        current = {repo->flagSettings(), FixtureStore(*repo).caps()};
    } catch (const std::exception& e) {
        setResult(tr("The club file could not be read: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }

    QStringList problems;
    Stored next = current;
    FlagSettings& f = next.flags;
    auto share = [&](const QString& label, const QString& typed, double& out) {
        const auto v = readNumber(typed);
        if (!v)
            problems << tr("%1: '%2' is not a number; type a share between 0 and 1, e.g. 0.9 or 90%.")
                            .arg(label, typed.trimmed());
        else if (!(*v > 0 && *v < 1))
            problems << tr("%1: %2 is not between 0 and 1 (both left out).").arg(label, typed.trimmed());
        else
            out = *v;
    };
    share(tr("Interval level"), m_form.level, f.level);
    share(tr("Off-target threshold"), m_form.off, f.offThreshold);
    share(tr("Watch threshold"), m_form.watch, f.watchThreshold);
    share(tr("FDR q"), m_form.fdrQ, f.fdrQ);
    f.fdr = m_form.fdr;
    f.matchVariation = m_form.variation;
    if (const auto b = readNumber(m_form.budget); b && *b >= 0 && *b <= 100 && !m_form.budget.contains(QLatin1Char('%')))
        f.falseFlagsPerSeason = *b;
    else
        problems << tr("False flags a season: '%1' is not a number from 0 (use the fixed threshold) to 100.")
                        .arg(m_form.budget.trimmed());
    {
        bool ok = false;
        const int n = m_form.seasonMatches.trimmed().toInt(&ok);
        if (ok && n >= 1 && n <= 120) f.seasonMatches = n;
        else
            problems << tr("Matches a season: '%1' is not a whole number from 1 to 120.")
                            .arg(m_form.seasonMatches.trimmed());
    }
    f.rateInterval = m_form.interval == 1 ? IntervalMethod::Jeffreys : IntervalMethod::Wilson;

    // The window in the text Window::parse reads, so the model's limits decide.
    std::string windowName;
    switch (m_form.windowKind) {
    case 0: windowName = "last" + m_form.windowN.trimmed().toStdString(); break;
    case 1: windowName = "season"; break;
    case 2: windowName = "ewma" + m_form.lambda.trimmed().toStdString(); break;
    default: windowName = "match"; break;
    }
    if (const auto w = Window::parse(windowName)) {
        f.window = *w;
    } else if (m_form.windowKind == 0) {
        problems << tr("Judged window: '%1' matches is not a whole number from 1 to 100.")
                        .arg(m_form.windowN.trimmed());
    } else {
        problems << tr("EWMA weight λ: '%1' is not a number above 0 and at most 1, e.g. 0.3.")
                        .arg(m_form.lambda.trimmed());
    }

    // The caps: whole numbers first, then the model's own check (parseCaps: 0 to 5).
    bool capsWhole = true;
    for (int row = 0; row < IntensityCapModel::kDays; ++row)
        if (!m_caps->typedCap(row)) {
            capsWhole = false;
            problems << tr("Intensity cap %1: '%2' is not a whole number; type 0 (no session) to 5.")
                            .arg(m_caps->dayAt(row), m_caps->texts().at(row).trimmed());
        }
    if (capsWhole) {
        const CapsResult checked = parseCaps(capsToJson(m_caps->typedCaps(current.caps)), "caps");
        for (const Problem& p : checked.errors) {
            const int row = IntensityCapModel::rowOfField(p.field);
            problems << tr("Intensity cap %1: %2.")
                            .arg(row >= 0 ? m_caps->dayAt(row) : QString::fromStdString(p.field),
                                 QString::fromStdString(p.message));
        }
        if (checked.errors.empty()) next.caps = checked.caps;
    }

    if (!problems.isEmpty()) {
        setResult(problems.join(QLatin1Char('\n')), tr("Nothing was saved: correct the fields named above and save again."));
        return false;
    }
    if (sameFlags(next.flags, current.flags) && next.caps == current.caps) {
        setResult({}, tr("Nothing to save: the form holds the stored settings."));
        return true;
    }
    if (!write(next)) return false;
    m_undo.push_back(current);
    m_reloadForm = true;
    setResult({}, tr("Saved. Every page now judges with these settings; Ctrl+Z puts the earlier ones back."));
    s->reload();
    return true;
}

bool SettingsView::undo() {
    ClubSession* s = session();
    if (m_undo.empty() || !s || !s->isOpen()) return false;
    const Stored previous = m_undo.back();
    if (!write(previous)) return false;
    m_undo.pop_back();
    m_reloadForm = true;
    setResult({}, tr("Put back the settings from before the last save."));
    s->reload();
    return true;
}

bool SettingsView::write(const Stored& values) {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) {
        setResult(tr("No club file is open."), {});
        return false;
    }
    try {
        // One transaction: the flags and the caps are saved together or not at all.
        repo->saveFlagSettings(values.flags, {FixtureStore::capsSetting(values.caps)});
    } catch (const std::exception& e) {
        setResult(tr("The settings were not saved: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }
    return true;
}

bool SettingsView::openClubFile(const QUrl& file) {
    ClubSession* s = session();
    const QString path = localPath(file);
    if (!s) return false;
    if (!QFileInfo(path).isFile()) {
        setResult(tr("There is no club file at %1.").arg(path), {});
        return false;
    }
    const QString before = s->clubFile();
    if (!s->openFile(path)) {
        setResult(tr("%1 could not be opened: %2").arg(path, s->errorString()),
                  before.isEmpty() ? QString() : tr("%1 stays open.").arg(before));
        return false;
    }
    rememberClubFile(path);
    setResult({}, tr("Opened %1; it opens again at the next start.").arg(path));
    return true;
}

void SettingsView::setResult(const QString& problems, const QString& message) {
    m_problems = problems;
    m_message = message;
    emit resultChanged();
}

} // namespace pitchloop::desktop
