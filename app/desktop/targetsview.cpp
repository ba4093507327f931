#include "targetsview.h"

#include "appclock.h"
#include "clubsession.h"
#include "display.h"
#include "metriclistmodel.h"
#include "pitchgeometry.h"
#include "repository.h"
#include "status.h"
#include "targetedits.h"
#include "targethistorymodel.h"
#include "wording.h"
#include "targetzonemodel.h"
#include "zonemapmodel.h"
#include "zonestate.h"

#include <QLocale>

#include <algorithm>
#include <cmath>
#include <set>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// A stored number as the form shows it: "45" for a share of 0.45 when `percent`.
QString formNumber(double v, bool percent) { return QString::number(percent ? 100 * v : v, 'g', 6); }

QString plural(qsizetype n, const QString& one, const QString& many) {
    return n == 1 ? QStringLiteral("1 %1").arg(one) : QStringLiteral("%1 %2").arg(n).arg(many);
}

} // namespace

std::optional<double> parseFormNumber(const QString& text, bool percent) {
    QString s = text.trimmed();
    if (s.endsWith(QLatin1Char('%'))) {
        if (!percent) return std::nullopt;
        s.chop(1);
        s = s.trimmed();
    }
    s.replace(QLatin1Char(','), QLatin1Char('.'));
    if (s.isEmpty()) return std::nullopt;
    bool ok = false;
    const double v = s.toDouble(&ok);
    if (!ok || !std::isfinite(v)) return std::nullopt;
    return percent ? v / 100 : v;
}

TargetsView::TargetsView(QObject* parent)
    : SessionClient(parent),
      m_today(QString::fromStdString(todayIso())),
      m_geometry(new PitchGeometry(this)),
      m_zones(new TargetZoneModel(this)),
      m_lastSeasonMap(new ZoneMapModel(this)),
      m_history(new TargetHistoryModel(this)) {}

// ---- inputs ---------------------------------------------------------------------------------

void TargetsView::setSeason(const QString& season) {
    if (season == m_season) return;
    m_season = season;
    m_needsFill = true;
    emit seasonChanged();
    update();
}

void TargetsView::setMetricId(const QString& id) {
    if (id == m_metricId) return;
    m_metricId = id;
    m_needsFill = true;
    emit metricIdChanged();
    update();
}

void TargetsView::setToday(const QString& isoDate) {
    if (isoDate == m_today || !isIsoDate(isoDate.toStdString())) return;
    m_today = isoDate;
    m_needsFill = true;
    emit todayChanged();
    update();
}

// ---- texts ----------------------------------------------------------------------------------

QString TargetsView::unitText() const {
    if (!m_kind) return {};
    switch (*m_kind) {
    case MetricKind::Rate: return QStringLiteral("%");
    case MetricKind::Count: return tr("a match");
    case MetricKind::Exposure: return tr("per exposure event");
    }
    return {};
}

QString TargetsView::marginUnitText() const {
    return isRate() ? tr("percentage points") : unitText();
}

QString TargetsView::sampleUnitText() const {
    if (!m_kind) return {};
    return *m_kind == MetricKind::Count ? tr("matches") : *m_kind == MetricKind::Rate ? m_itemsWord
                                                                                      : tr("exposure events");
}

QString TargetsView::asOfText() const {
    return m_season.isEmpty() ? QString() : tr("Targets in force on %1").arg(dateText(asOf()));
}

QString TargetsView::copyText() const {
    if (m_previousSeason.isEmpty()) return {};
    if (m_copyCount == 0) return tr("No targets in %1 to copy").arg(m_previousSeason);
    return tr("Copy %1 from %2").arg(plural(m_copyCount, tr("target"), tr("targets")), m_previousSeason);
}

QStringList TargetsView::selectedZones() const {
    QStringList out;
    for (const Zone& z : m_selected) out << QStringLiteral("%1,%2").arg(z.band).arg(z.lane);
    return out;
}

bool TargetsView::wholePitchSelected() const { return isSelected(0, 0); }

QString TargetsView::selectionText() const {
    if (m_selected.empty()) return tr("no zone selected");
    if (m_selected.size() == 1)
        return zoneText(m_selected.front().band, m_selected.front().lane, session() ? session()->grid() : ZoneGrid{});
    return tr("%1 zones selected").arg(m_selected.size());
}

QString TargetsView::focusText() const {
    return m_hasFocus ? zoneText(m_focus.band, m_focus.lane, session() ? session()->grid() : ZoneGrid{}) : QString();
}

QString TargetsView::focusTargetText() const {
    if (!m_hasFocus || !m_kind) return {};
    const auto t = inForce(versionsOf(m_focus.band, m_focus.lane), asOf());
    if (!t) return tr("No target in force");
    return tr("%1 in force since %2").arg(targetText(*m_kind, t), compactDateText(t->effectiveFrom));
}

QString TargetsView::undoText() const {
    return m_undo ? tr("Undo: %1").arg(m_undo->description) : QString();
}

// ---- form -----------------------------------------------------------------------------------

void TargetsView::markEdited() {
    m_edited = true;
    emit formChanged();
}

void TargetsView::setValueText(const QString& text) {
    if (text == m_valueText) return;
    m_valueText = text;
    markEdited();
}

void TargetsView::setDirection(int direction) {
    if (direction == m_direction || direction < 0 || direction > 1) return;
    m_direction = direction;
    markEdited();
}

void TargetsView::setMarginText(const QString& text) {
    if (text == m_marginText) return;
    m_marginText = text;
    markEdited();
}

void TargetsView::setMinSampleText(const QString& text) {
    if (text == m_minSampleText) return;
    m_minSampleText = text;
    markEdited();
}

void TargetsView::setRationale(const QString& text) {
    if (text == m_rationale) return;
    m_rationale = text;
    emit formChanged(); // who and why are the user's, never filled in: not an edit of the rule
}

void TargetsView::setAuthor(const QString& text) {
    if (text == m_author) return;
    m_author = text;
    emit formChanged();
}

void TargetsView::setEffectiveFrom(const QString& text) {
    if (text == m_effectiveFrom) return;
    m_effectiveFrom = text;
    markEdited();
}

void TargetsView::fillForm() {
    if (!m_kind) return;
    const bool percent = isRate();
    const auto t = m_hasFocus ? inForce(versionsOf(m_focus.band, m_focus.lane), asOf()) : std::nullopt;
    if (t) {
        m_valueText = formNumber(t->value, percent);
        m_direction = t->direction == Direction::AtMost ? 1 : 0;
        m_marginText = formNumber(t->watchMargin, percent);
        m_minSampleText = QString::number(t->minSample);
    } else {
        m_valueText.clear();
        m_direction = m_defaultDirection == Direction::AtMost ? 1 : 0;
        m_marginText = formNumber(defaultWatchMargin(*m_kind), percent);
        m_minSampleText = QString::number(defaultMinSample(*m_kind));
    }
    m_effectiveFrom = QString::fromStdString(asOf());
    m_edited = false;
    emit formChanged();
}

void TargetsView::setMessages(const QString& error, const QString& status) {
    m_formError = error;
    m_statusText = status;
    emit messagesChanged();
}

// ---- what is shown --------------------------------------------------------------------------

std::string TargetsView::asOf() const {
    const std::string season = m_season.toStdString();
    const std::string today = m_today.toStdString();
    if (!isSeasonName(season)) return today;
    return std::clamp(today, seasonStart(season), seasonEnd(season));
}

std::vector<Target> TargetsView::versionsOf(int band, int lane) const {
    std::vector<Target> out;
    const std::string metric = m_metricId.toStdString();
    for (const auto& t : m_versions)
        if (t.key.metric == metric && t.key.band == band && t.key.lane == lane) out.push_back(t);
    return out;
}

bool TargetsView::isSelected(int band, int lane) const {
    return std::find(m_selected.begin(), m_selected.end(), Zone{band, lane}) != m_selected.end();
}

void TargetsView::clear() {
    m_seasonOptions.clear();
    m_metricRow = -1;
    m_kind.reset();
    m_metricName.clear();
    m_betterText.clear();
    m_previousSeason.clear();
    m_hasPreviousSeason = false;
    m_lastSeasonText.clear();
    m_wholePitchTarget.clear();
    m_wholePitchLastSeason.clear();
    m_copyCount = 0;
    m_versions.clear();
    m_zones->reset({});
    m_lastSeasonMap->clear();
    m_history->reset({});
}

void TargetsView::refresh() {
    ClubSession* s = session();
    if (!s || !s->isOpen()) {
        clear();
        emit changed();
        return;
    }
    if (s->clubFile() != m_clubFile) { // another club file: nothing of the old one applies
        m_clubFile = s->clubFile();
        m_selected.clear();
        m_hasFocus = false;
        m_needsFill = true;
        if (m_undo) {
            m_undo.reset();
            emit undoChanged();
        }
    }
    ClubRepository& repo = *s->repository();
    const auto& matches = s->matchSummaries();
    m_squad = matches.empty() ? TargetKey{}.squad : matches.back().squad;

    // Seasons: those stored, today's, and the one after the latest match (to prepare it).
    const std::vector<std::string> stored = repo.seasons(m_squad);
    std::set<std::string> options(stored.begin(), stored.end());
    options.insert(seasonOf(m_today.toStdString()));
    if (!matches.empty()) options.insert(nextSeason(matches.back().season));
    if (!isSeasonName(m_season.toStdString())) {
        m_season = QString::fromStdString(matches.empty() ? seasonOf(m_today.toStdString())
                                                          : matches.back().season);
        emit seasonChanged();
    }
    options.insert(m_season.toStdString());
    m_seasonOptions.clear();
    for (const auto& o : options) m_seasonOptions << QString::fromStdString(o);
    const std::string season = m_season.toStdString();

    const MetricSpec* metric = s->metricSpec(m_metricId.toStdString());
    if (!metric && !s->metricSpecs().empty()) metric = &s->metricSpecs().front();
    if (!metric) {
        clear();
        emit changed();
        return;
    }
    if (const QString id = QString::fromStdString(metric->id); id != m_metricId) {
        m_metricId = id;
        emit metricIdChanged();
    }
    const MetricKind kind = metric->kind();
    m_kind = kind;
    m_itemsWord = QString::fromStdString(model::words::itemsWord(*metric));
    m_defaultDirection = defaultDirection(*metric);
    m_metricName = QString::fromStdString(metric->name.empty() ? metric->id : metric->name);
    m_betterText = desktop::betterText(metric->better);
    m_metricRow = s->metrics()->indexOf(m_metricId);

    const ZoneGrid& grid = s->grid();
    m_geometry->setZoneGrid(grid);
    if (!matches.empty()) m_geometry->setPitch(matches.back().pitch);
    m_versions = repo.targets(m_squad, season);

    // Last season's achieved values: its season window at its last match, every zone.
    m_previousSeason = QString::fromStdString(model::previousSeason(season));
    const bool previousStored =
        std::find(stored.begin(), stored.end(), m_previousSeason.toStdString()) != stored.end();
    SeasonTallies last;
    if (previousStored) last = repo.seasonTallies(m_squad, m_previousSeason.toStdString());
    m_hasPreviousSeason = !last.matchIds.empty();
    std::vector<ZoneStatus> achieved;
    if (m_hasPreviousSeason)
        achieved = computeStatus(last, last.matchIds.size() - 1, {*metric}, {}, grid,
                                 {Window{Window::Kind::Season, 0, 0.3}}, s->flagSettings());
    const auto achievedAt = [&](int band, int lane) -> const ZoneStatus* {
        for (const auto& a : achieved)
            if (a.band == band && a.lane == lane) return &a;
        return nullptr;
    };
    m_lastSeasonText =
        m_hasPreviousSeason
            ? tr("Small figures: what %1 achieved over its %2 (season totals).")
                  .arg(m_previousSeason, plural(static_cast<qsizetype>(last.matchIds.size()), tr("match"), tr("matches")))
            : tr("No %1 season in this club file, so there is no last-season value to show beside the targets.")
                  .arg(m_previousSeason);

    const std::string on = asOf();
    std::vector<TargetZone> zones;
    std::vector<const ZoneStatus*> cells;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const Zone z = grid.zoneAt(i);
        TargetZone t;
        t.band = z.band;
        t.lane = z.lane;
        t.zoneName = zoneText(z.band, z.lane, grid);
        const auto current = inForce(versionsOf(z.band, z.lane), on);
        t.hasTarget = current.has_value();
        t.targetText = current ? targetText(kind, current) : tr("no target");
        if (const ZoneStatus* a = achievedAt(z.band, z.lane)) {
            t.hasLastSeason = true;
            t.lastSeasonText = desktop::valueText(kind, a->value);
            cells.push_back(a);
        }
        t.selected = isSelected(z.band, z.lane);
        zones.push_back(std::move(t));
    }
    m_zones->reset(std::move(zones));
    const auto whole = inForce(versionsOf(0, 0), on);
    m_wholePitchTarget = whole ? targetText(kind, whole) : tr("no target");
    const ZoneStatus* wholeAchieved = achievedAt(0, 0);
    m_wholePitchLastSeason = wholeAchieved ? desktop::valueText(kind, wholeAchieved->value) : QString();
    if (m_hasPreviousSeason) {
        const ScaleDomain domain = scaleDomain(kind, pooledValues(cells, kind, grid));
        ZoneMapModel::Header h{tr("%1 achieved").arg(m_previousSeason), m_metricName, {},
                               ZoneState::NoTarget, scaleLabels(kind, domain),
                               levelText(s->flagSettings().level)};
        if (wholeAchieved) h.wholePitchText = wholePitchLine(*wholeAchieved, kind);
        m_lastSeasonMap->reset(std::move(h), zoneCells(cells, kind, domain, grid));
    } else {
        m_lastSeasonMap->clear();
    }
    m_copyCount = previousStored
                      ? static_cast<int>(copySeasonTargets(repo.targets(m_squad, m_previousSeason.toStdString()),
                                                           m_previousSeason.toStdString(), season, {})
                                             .size())
                      : 0;

    // Zones that left the grid (another grid in another file) leave the selection.
    std::erase_if(m_selected, [&](const Zone& z) {
        return !(z.band == 0 && z.lane == 0) &&
               (z.band < 1 || z.lane < 1 || z.band > grid.bands() || z.lane > grid.lanes());
    });
    selectionUpdated(false);
    if (m_needsFill) {
        m_needsFill = false;
        fillForm();
    }
    emit changed();
}

void TargetsView::selectionUpdated(bool refill) {
    std::sort(m_selected.begin(), m_selected.end(), [](const Zone& a, const Zone& b) {
        return a.band != b.band ? a.band < b.band : a.lane < b.lane;
    });
    m_zones->setSelection([this](int band, int lane) { return isSelected(band, lane); });
    if (m_hasFocus && m_kind)
        m_history->reset(historyRows(versionsOf(m_focus.band, m_focus.lane), *m_kind, asOf()));
    else
        m_history->reset({});
    if (refill && !m_edited) fillForm();
    emit selectionChanged();
}

// ---- selection ------------------------------------------------------------------------------

void TargetsView::selectZone(int band, int lane, bool additive) {
    if (!session()) return;
    const ZoneGrid grid = session()->grid();
    const Zone z{band, lane};
    const bool whole = band == 0 && lane == 0;
    if (!whole && (band < 1 || lane < 1 || band > grid.bands() || lane > grid.lanes())) return;
    if (whole || !additive) {
        m_selected = {z};
        m_focus = z;
    } else {
        std::erase(m_selected, Zone{0, 0});
        if (isSelected(band, lane)) {
            std::erase(m_selected, z);
            if (m_focus == z && !m_selected.empty()) m_focus = m_selected.back();
        } else {
            m_selected.push_back(z);
            m_focus = z;
        }
    }
    m_hasFocus = !m_selected.empty();
    selectionUpdated(!additive);
}

void TargetsView::selectArea(int band1, int lane1, int band2, int lane2, bool additive) {
    if (!session()) return;
    const ZoneGrid& grid = session()->grid();
    const int b0 = std::clamp(std::min(band1, band2), 1, grid.bands());
    const int b1 = std::clamp(std::max(band1, band2), 1, grid.bands());
    const int l0 = std::clamp(std::min(lane1, lane2), 1, grid.lanes());
    const int l1 = std::clamp(std::max(lane1, lane2), 1, grid.lanes());
    if (!additive) m_selected.clear();
    std::erase(m_selected, Zone{0, 0});
    for (int b = b0; b <= b1; ++b)
        for (int l = l0; l <= l1; ++l)
            if (!isSelected(b, l)) m_selected.push_back({b, l});
    m_focus = {std::clamp(band1, 1, grid.bands()), std::clamp(lane1, 1, grid.lanes())};
    m_hasFocus = true;
    selectionUpdated(!additive);
}

void TargetsView::clearSelection() {
    m_selected.clear();
    m_hasFocus = false;
    selectionUpdated(false);
}

// ---- writes ---------------------------------------------------------------------------------

void TargetsView::write(std::vector<Target> versions, const QString& description) {
    ClubSession* s = session();
    ClubRepository& repo = *s->repository();
    Undo undo;
    undo.description = description;
    undo.squad = m_squad;
    undo.season = m_season.toStdString();
    undo.before = repo.targets(undo.squad, undo.season);
    const std::string now = nowUtcIso();
    for (auto& v : versions)
        if (v.recordedAt.empty()) v.recordedAt = now;
    const auto ids = repo.addTargets(versions, now);
    for (std::size_t i = 0; i < versions.size() && i < ids.size(); ++i) versions[i].version = ids[i];
    undo.added = std::move(versions);
    m_undo = std::move(undo);
    emit undoChanged();
    m_edited = false;
    s->reload(); // every page judges against the new targets; this page refreshes too
}

bool TargetsView::save() {
    ClubSession* s = session();
    QStringList errors;
    if (!s || !s->isOpen() || !m_kind) {
        setMessages(tr("No club file or metric to set a target for."), {});
        return false;
    }
    const bool percent = isRate();
    if (m_selected.empty())
        errors << tr("Zones: none selected. Click a zone on the pitch (Shift+click adds one; drag to take a rectangle).");
    const auto value = parseFormNumber(m_valueText, percent);
    if (m_valueText.trimmed().isEmpty())
        errors << (percent ? tr("Value: type the target as a percentage, such as 45 or 45%.")
                           : tr("Value: type the target, such as 2.5."));
    else if (!value || *value < 0 || (percent && *value > 1))
        errors << (percent ? tr("Value “%1”: a rate target is a percentage from 0 to 100, such as 45 or 45%.")
                           : tr("Value “%1”: expected a number of 0 or more, such as 2.5."))
                      .arg(m_valueText);
    std::optional<double> margin = defaultWatchMargin(*m_kind);
    if (!m_marginText.trimmed().isEmpty()) {
        margin = parseFormNumber(m_marginText, percent);
        if (!margin || *margin < 0)
            errors << tr("Margin “%1”: expected a number of 0 or more (%2).").arg(m_marginText, marginUnitText());
    }
    long minSample = defaultMinSample(*m_kind);
    if (!m_minSampleText.trimmed().isEmpty()) {
        bool ok = false;
        const long long n = m_minSampleText.trimmed().toLongLong(&ok);
        if (!ok || n < 0) errors << tr("Minimum sample “%1”: expected a whole number of 0 or more.").arg(m_minSampleText);
        else minSample = static_cast<long>(n);
    }
    if (m_author.trimmed().isEmpty()) errors << tr("Author: say who sets this target.");
    if (!isIsoDate(m_effectiveFrom.trimmed().toStdString()))
        errors << tr("Effective from “%1”: expected a date such as 2026-10-01 (year-month-day).").arg(m_effectiveFrom);
    if (!errors.isEmpty()) {
        setMessages(errors.join(QLatin1Char('\n')), {});
        return false;
    }

    Target base;
    base.key.squad = m_squad;
    base.key.season = m_season.toStdString();
    base.key.metric = m_metricId.toStdString();
    base.direction = m_direction == 1 ? Direction::AtMost : Direction::AtLeast;
    base.value = *value;
    base.watchMargin = *margin;
    base.minSample = minSample;
    base.author = m_author.trimmed().toStdString();
    base.rationale = m_rationale.trimmed().toStdString();
    base.effectiveFrom = m_effectiveFrom.trimmed().toStdString();
    std::vector<Target> versions;
    for (const Zone& z : m_selected) {
        Target t = base;
        t.key.band = z.band;
        t.key.lane = z.lane;
        versions.push_back(std::move(t));
    }
    const QString what = tr("set %1 of %2 to %3")
                             .arg(plural(static_cast<qsizetype>(versions.size()), tr("target"), tr("targets")),
                                  m_metricName, targetText(*m_kind, base));
    try {
        write(std::move(versions), what);
    } catch (const std::exception& e) {
        setMessages(tr("Could not save the targets: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }
    setMessages({}, tr("Saved: %1, in force from %2.").arg(what, compactDateText(base.effectiveFrom)));
    return true;
}

bool TargetsView::retire() {
    ClubSession* s = session();
    if (!s || !s->isOpen() || !m_kind) {
        setMessages(tr("No club file or metric to retire a target of."), {});
        return false;
    }
    QStringList errors;
    if (m_selected.empty()) errors << tr("Zones: none selected. Click the zones whose targets should end.");
    if (m_author.trimmed().isEmpty()) errors << tr("Author: say who retires this target.");
    const std::string from = m_effectiveFrom.trimmed().toStdString();
    if (!isIsoDate(from))
        errors << tr("Effective from “%1”: expected a date such as 2026-10-01 (year-month-day).").arg(m_effectiveFrom);
    if (!errors.isEmpty()) {
        setMessages(errors.join(QLatin1Char('\n')), {});
        return false;
    }
    std::vector<Target> versions;
    for (const Zone& z : m_selected) {
        auto current = inForce(versionsOf(z.band, z.lane), from);
        if (!current) continue;
        Target t = *current; // keeps the last rule on record
        t.retired = true;
        t.effectiveFrom = from;
        t.author = m_author.trimmed().toStdString();
        t.rationale = m_rationale.trimmed().toStdString();
        t.recordedAt.clear();
        t.version = 0;
        versions.push_back(std::move(t));
    }
    if (versions.empty()) {
        setMessages(tr("No target of %1 is in force on %2 in the selected zones, so there is nothing to retire.")
                        .arg(m_metricName, compactDateText(from)),
                    {});
        return false;
    }
    const QString what = tr("retired %1 of %2").arg(plural(static_cast<qsizetype>(versions.size()), tr("target"),
                                                           tr("targets")),
                                                    m_metricName);
    try {
        write(std::move(versions), what);
    } catch (const std::exception& e) {
        setMessages(tr("Could not retire the targets: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }
    setMessages({}, tr("Done: %1 from %2. The history keeps every earlier version.").arg(what, compactDateText(from)));
    return true;
}

bool TargetsView::copyFromPreviousSeason() {
    ClubSession* s = session();
    if (!s || !s->isOpen() || m_previousSeason.isEmpty()) {
        setMessages(tr("No earlier season to copy targets from."), {});
        return false;
    }
    if (m_author.trimmed().isEmpty()) {
        setMessages(tr("Author: say who copies last season's targets."), {});
        return false;
    }
    const std::string from = m_previousSeason.toStdString();
    const std::string to = m_season.toStdString();
    std::vector<Target> copies;
    try {
        copies = copySeasonTargets(s->repository()->targets(m_squad, from), from, to,
                                   m_author.trimmed().toStdString());
    } catch (const std::exception& e) {
        setMessages(tr("Could not read %1's targets: %2").arg(m_previousSeason, QString::fromUtf8(e.what())), {});
        return false;
    }
    if (copies.empty()) {
        setMessages(tr("No targets were in force at the end of %1, so there is nothing to copy.").arg(m_previousSeason), {});
        return false;
    }
    const QString what = tr("copied %1 from %2 into %3")
                             .arg(plural(static_cast<qsizetype>(copies.size()), tr("target"), tr("targets")),
                                  m_previousSeason, m_season);
    try {
        write(std::move(copies), what);
    } catch (const std::exception& e) {
        setMessages(tr("Could not copy the targets: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }
    fillForm(); // show what now stands in the focused zone
    setMessages({}, tr("Done: %1, in force from %2.").arg(what, compactDateText(seasonStart(to))));
    return true;
}

bool TargetsView::undo() {
    ClubSession* s = session();
    if (!m_undo || !s || !s->isOpen()) return false;
    const Undo& u = *m_undo;
    const std::string author = m_author.trimmed().isEmpty() ? u.added.front().author : m_author.trimmed().toStdString();
    const std::string now = nowUtcIso();
    try {
        s->repository()->addTargets(
            revertVersions(u.before, u.added, author, "undo: " + u.description.toStdString(), now), now);
    } catch (const std::exception& e) {
        setMessages(tr("Could not undo: %1").arg(QString::fromUtf8(e.what())), {});
        return false;
    }
    const QString what = u.description;
    m_undo.reset();
    emit undoChanged();
    m_needsFill = true;
    setMessages({}, tr("Undone: %1. What was in force before is back; the history keeps every version.").arg(what));
    s->reload();
    return true;
}

} // namespace pitchloop::desktop
