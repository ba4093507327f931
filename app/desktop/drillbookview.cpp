#include "drillbookview.h"

#include "appclock.h"
#include "clubsession.h"
#include "display.h"
#include "logging.h"
#include "drillbrowse.h"
#include "drilllistmodel.h"
#include "pitchgeometry.h"
#include "planner.h"

#include <QRegularExpression>

#include <algorithm>
#include <map>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QVariantMap option(const QString& text, const QVariant& value) {
    return {{QStringLiteral("text"), text}, {QStringLiteral("value"), value}};
}

/// The form field and the words people read for a drill file key ("players.min",
/// "coaching_points[1]", "edited_by", ...).
std::pair<QString, QString> fieldLabel(const std::string& key) {
    static const QRegularExpression indexed(QStringLiteral("^([a-z_]+)\\[(\\d+)\\]$"));
    const QString k = QString::fromStdString(key);
    const auto m = indexed.match(k);
    if (m.hasMatch()) {
        const QString root = m.captured(1);
        const int n = m.captured(2).toInt() + 1;
        if (root == QLatin1String("coaching_points"))
            return {QStringLiteral("coachingPoints"), DrillBookView::tr("Coaching point %1").arg(n)};
        if (root == QLatin1String("equipment"))
            return {QStringLiteral("equipment"), DrillBookView::tr("Equipment item %1").arg(n)};
        if (root == QLatin1String("tags")) return {QStringLiteral("tags"), DrillBookView::tr("Tag %1").arg(n)};
        if (root == QLatin1String("metrics")) return {QStringLiteral("metrics"), DrillBookView::tr("Metric %1").arg(n)};
        if (root == QLatin1String("zones")) return {QStringLiteral("zones"), DrillBookView::tr("Zone %1").arg(n)};
    }
    static const std::map<std::string, std::pair<const char*, const char*>> kFields{
        {"title", {"title", "Title"}},
        {"author", {"author", "Author"}},
        {"purpose", {"purpose", "Purpose"}},
        {"organisation", {"organisation", "Set-up and rules"}},
        {"duration_min", {"minutes", "Minutes"}},
        {"intensity", {"intensity", "Intensity"}},
        {"players", {"playersMin", "Players"}},
        {"players.min", {"playersMin", "Fewest players"}},
        {"players.max", {"playersMax", "Most players"}},
        {"area_m.length", {"areaLength", "Area length"}},
        {"area_m.width", {"areaWidth", "Area width"}},
        {"edited_by", {"savedBy", "Saved by"}}};
    if (const auto it = kFields.find(key); it != kFields.end())
        return {QString::fromLatin1(it->second.first), DrillBookView::tr(it->second.second)};
    return {QString(), k};
}

/// One problem of the drill book as a sentence: "Title is required.",
/// "Minutes: expected 1–180, found 0."
QString sentence(const QString& label, const std::string& message) {
    const QString m = QString::fromStdString(message);
    if (label.isEmpty()) return m.left(1).toUpper() + m.mid(1) + QLatin1Char('.');
    if (m == QLatin1String("required")) return DrillBookView::tr("%1 is required.").arg(label);
    if (m == QLatin1String("say who writes it") || m == QLatin1String("say who edits it"))
        return DrillBookView::tr("%1: say who writes this version.").arg(label);
    return QStringLiteral("%1: %2.").arg(label, m);
}

} // namespace

DrillBookView::DrillBookView(QObject* parent)
    : SessionClient(parent),
      m_form(new DrillForm(this)),
      m_drills(new DrillListModel(this)),
      m_versions(new DrillListModel(this)),
      m_geometry(new PitchGeometry(this)) {
    m_form->clear();
    m_editorTitle = tr("New drill");
}

DrillBookView::~DrillBookView() = default;

ClubRepository* DrillBookView::repository() const {
    return session() && session()->isOpen() ? session()->repository() : nullptr;
}

// ---- filters --------------------------------------------------------------------------------

void DrillBookView::setSearchText(const QString& v) {
    if (v == m_searchText) return;
    m_searchText = v;
    emit filtersChanged();
    update();
}

void DrillBookView::setTagFilter(const QString& v) {
    if (v == m_tagFilter) return;
    m_tagFilter = v;
    emit filtersChanged();
    update();
}

void DrillBookView::setMetricFilter(const QString& v) {
    if (v == m_metricFilter) return;
    m_metricFilter = v;
    emit filtersChanged();
    update();
}

void DrillBookView::setZoneFilter(int v) {
    if (v == m_zoneFilter) return;
    m_zoneFilter = v;
    emit filtersChanged();
    update();
}

void DrillBookView::setIntensityFilter(int v) {
    if (v == m_intensityFilter) return;
    m_intensityFilter = v;
    emit filtersChanged();
    update();
}

void DrillBookView::setIncludeDeleted(bool v) {
    if (v == m_includeDeleted) return;
    m_includeDeleted = v;
    emit filtersChanged();
    update();
}

void DrillBookView::clearFilters() {
    m_searchText.clear();
    m_tagFilter.clear();
    m_metricFilter.clear();
    m_zoneFilter = 0;
    m_intensityFilter = 0;
    m_includeDeleted = false;
    emit filtersChanged();
    update();
}

bool DrillBookView::filtered() const {
    return !m_searchText.trimmed().isEmpty() || !m_tagFilter.isEmpty() || !m_metricFilter.isEmpty() ||
           m_zoneFilter > 0 || m_intensityFilter > 0;
}

QVariantList DrillBookView::intensityOptions() const {
    QVariantList out{option(tr("Any intensity"), 0)};
    for (int level = kIntensityMin; level <= kIntensityMax; ++level)
        out << option(intensityText(level), level);
    return out;
}

QVariantList DrillBookView::intensityLevels() const {
    QVariantList out;
    for (int level = kIntensityMin; level <= kIntensityMax; ++level)
        out << option(intensityText(level), level);
    return out;
}

QString DrillBookView::loadCaution() const {
    return tr("Intensity describes the drill; it is not a measure of a player's load. %1")
        .arg(QString::fromUtf8(kPlanCaution.data(), static_cast<qsizetype>(kPlanCaution.size())));
}

QString DrillBookView::metricName(const std::string& id) const {
    if (session())
        if (const MetricSpec* m = session()->metricSpec(id))
            return QString::fromStdString(m->name.empty() ? m->id : m->name);
    return QString::fromStdString(id);
}

// ---- computing ------------------------------------------------------------------------------

void DrillBookView::refresh() {
    ClubRepository* repo = repository();
    if (repo != m_repo) {
        // Another club file: its drills, form and undo steps are not this one's.
        m_repo = repo;
        m_firstLoad = repo != nullptr;
        m_undo.clear();
        m_selectedId = 0;
        m_loadedVersion = 0;
        m_form->clear();
        setProblems({}, {});
        setStatus({});
    }
    const bool opened = m_repo == repo && m_firstLoad;
    refreshList();
    // A freshly opened book shows its first drill (Ctrl+N starts a new one).
    if (opened && m_selectedId == 0 && !m_form->dirty() && m_drills->count() > 0) {
        m_selectedId = m_drills->idAt(0);
        if (const auto first = DrillBook(*repo).get(m_selectedId)) m_form->load(*first);
    }
    m_firstLoad = false;
    refreshSelection();
}

void DrillBookView::refreshList() {
    ClubRepository* repo = repository();
    if (!repo) {
        m_drills->reset({}, ZoneGrid{});
        m_tagOptions = {option(tr("Any tag"), QString())};
        m_metricOptions = {option(tr("Any metric"), QString())};
        m_zoneOptions = {option(tr("Any zone"), QVariant())};
        m_total = 0;
        m_resultText = tr("No club file is open.");
        emit listChanged();
        return;
    }
    DrillBook book(*repo);
    const std::vector<Drill> all = book.list(m_includeDeleted);
    m_total = static_cast<int>(all.size());

    m_tagOptions = {option(tr("Any tag"), QString())};
    for (const auto& t : drillTags(all)) m_tagOptions << option(QString::fromStdString(t), QString::fromStdString(t));
    m_metricOptions = {option(tr("Any metric"), QString())};
    for (const auto& m : session()->metricSpecs())
        m_metricOptions << option(QString::fromStdString(m.name.empty() ? m.id : m.name), QString::fromStdString(m.id));
    const ZoneGrid& grid = session()->grid();
    m_form->setGrid(grid);
    m_zoneOptions = {option(tr("Any zone"), QVariant())};
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const Zone z = grid.zoneAt(i);
        m_zoneOptions << option(zoneText(z.band, z.lane, grid), QVariantMap{{QStringLiteral("band"), z.band},
                                                                      {QStringLiteral("lane"), z.lane}});
    }
    m_geometry->setZoneGrid(grid);
    if (!session()->matchSummaries().empty()) m_geometry->setPitch(session()->matchSummaries().back().pitch);

    DrillFilter filter;
    filter.query.text = m_searchText.toStdString();
    filter.query.tag = m_tagFilter.toStdString();
    filter.query.metric = m_metricFilter.toStdString();
    if (m_zoneFilter > 0 && m_zoneFilter <= grid.zoneCount()) filter.query.zone = grid.zoneAt(m_zoneFilter - 1);
    filter.query.includeDeleted = m_includeDeleted;
    filter.intensity = m_intensityFilter;
    std::vector<Drill> found = browseDrills(book, filter);
    const int shown = static_cast<int>(found.size());
    m_drills->reset(std::move(found), session()->grid(), [this](const std::string& id) { return metricName(id); });

    if (m_total == 0)
        m_resultText = tr("The drill book is empty.");
    else if (filtered())
        m_resultText = tr("%1 of %2 drills match").arg(shown).arg(m_total);
    else
        m_resultText = m_total == 1 ? tr("1 drill") : tr("%1 drills").arg(m_total);
    emit listChanged();
}

void DrillBookView::refreshSelection() {
    ClubRepository* repo = repository();
    std::optional<Drill> current;
    if (repo && m_selectedId != 0) current = DrillBook(*repo).get(m_selectedId);
    if (m_selectedId != 0 && !current) {
        m_selectedId = 0;
        m_loadedVersion = 0;
        m_form->clear();
    }
    if (current) {
        std::vector<Drill> history = DrillBook(*repo).history(m_selectedId);
        std::reverse(history.begin(), history.end()); // newest first
        m_versions->resetVersions(std::move(history), session()->grid(), [this](const std::string& id) { return metricName(id); });
        m_selectedDeleted = current->deleted;
        m_editorTitle = tr("Drill %1 · %2").arg(m_selectedId).arg(QString::fromStdString(current->title));
        m_editorDetail =
            (current->deleted ? tr("Deleted — restore it to edit it. ") : QString()) +
            tr("Version %1 of %2, written %3 by %4; first added %5.")
                .arg(m_loadedVersion > 0 ? m_loadedVersion : current->versionCount)
                .arg(current->versionCount)
                .arg(compactDateText(current->editedAt.substr(0, 10)),
                     QString::fromStdString(current->editedBy),
                     compactDateText(current->createdAt.substr(0, 10))) +
            (current->zonesGrid.empty()
                 ? QString()
                 : tr(" Its zones were drawn on %1 and are shown where they fall on the club's "
                      "grid; saving stores them on it.")
                       .arg(QString::fromStdString(current->zonesGrid)));
    } else {
        m_versions->reset({}, ZoneGrid{});
        m_selectedDeleted = false;
        m_editorTitle = tr("New drill");
        m_editorDetail = repo ? tr("Fill in the fields and save (Ctrl+S). Fields marked * are required.")
                              : QString();
    }
    emit selectionChanged();
}

void DrillBookView::setProblems(QStringList problems, QVariantMap fieldErrors) {
    if (problems == m_problems && fieldErrors == m_fieldErrors) return;
    m_problems = std::move(problems);
    m_fieldErrors = std::move(fieldErrors);
    emit problemsChanged();
}

void DrillBookView::setStatus(const QString& text) {
    m_statusText = text;
    emit statusChanged();
}

QString DrillBookView::undoText() const {
    if (m_undo.empty()) return tr("Nothing to undo");
    const UndoStep& s = m_undo.back();
    switch (s.kind) {
    case UndoStep::Kind::Added: return tr("Undo adding “%1”").arg(s.title);
    case UndoStep::Kind::Edited: return tr("Undo the edit of “%1”").arg(s.title);
    case UndoStep::Kind::Deleted: return tr("Undo deleting “%1”").arg(s.title);
    case UndoStep::Kind::Restored: return tr("Undo restoring “%1”").arg(s.title);
    }
    return {};
}

// ---- actions --------------------------------------------------------------------------------

bool DrillBookView::guard(const QString& what, const std::function<bool()>& action) {
    try {
        return action();
    } catch (const std::exception& e) {
        const QString message = tr("%1: %2").arg(what, QString::fromUtf8(e.what()));
        qCWarning(lcDesktop).noquote() << message;
        setStatus(message);
        return false;
    }
}

void DrillBookView::newDrill() {
    m_selectedId = 0;
    m_loadedVersion = 0;
    m_form->clear();
    setProblems({}, {});
    refreshSelection();
}

bool DrillBookView::selectDrill(qint64 drillId) {
    return guard(tr("Cannot read the drill"), [&] { return selectDrillNow(drillId); });
}

bool DrillBookView::selectDrillNow(qint64 drillId) {
    ClubRepository* repo = repository();
    if (!repo) return false;
    const auto drill = DrillBook(*repo).get(drillId);
    if (!drill) return false;
    m_selectedId = drillId;
    m_loadedVersion = 0;
    m_form->load(*drill);
    setProblems({}, {});
    refreshSelection();
    return true;
}

bool DrillBookView::loadVersion(int row) {
    const Drill* v = m_versions->at(row);
    if (!v) return false;
    m_form->load(*v);
    m_loadedVersion = v->versionCount;
    setProblems({}, {});
    refreshSelection();
    setStatus(tr("Version %1 is in the form; save to make it the latest version.").arg(v->versionCount));
    return true;
}

void DrillBookView::afterWrite(qint64 selectId) {
    m_selectedId = selectId;
    m_loadedVersion = 0;
    // Every page reads the club file again (focuses and the planner show drills too); this
    // page's own refresh follows from it.
    if (session()) session()->reload();
    else update();
}

bool DrillBookView::save() {
    return guard(tr("Cannot save the drill"), [&] { return saveNow(); });
}

bool DrillBookView::saveNow() {
    ClubRepository* repo = repository();
    if (!repo) return false;
    std::vector<DrillForm::Problem> typed;
    const Drill drill = m_form->toDrill(typed);
    // A new drill's first version is the author's unless someone else is named (as the
    // command line's `drills add` does); an edit must say who makes it.
    std::string who = m_form->savedBy().trimmed().toStdString();
    if (who.empty() && m_selectedId == 0) who = drill.author;
    const std::string now = nowUtcIso();
    DrillBook book(*repo);

    QStringList problems;
    QVariantMap fields;
    QStringList typedFields;
    for (const auto& p : typed) {
        problems << p.message;
        typedFields << p.field;
        if (!fields.contains(p.field)) fields.insert(p.field, p.message);
    }
    DrillChange change;
    std::optional<Drill> before;
    if (m_selectedId != 0) before = book.get(m_selectedId);
    if (typed.empty()) {
        change = m_selectedId == 0 ? book.add(drill, who, now, "form")
                                   : book.edit(m_selectedId, drill, who, now, "form");
    } else {
        // The book is not written; its own check still names every other field to fix.
        change.problems = validateDrill(drill, book.metrics(), book.grid(), "form");
        if (who.empty()) change.problems.push_back({"form", "", "edited_by", "say who writes it"});
    }
    for (const auto& p : change.problems) {
        const auto [field, label] = fieldLabel(p.field);
        if (typedFields.contains(field)) continue; // what was typed there is reported above
        const QString text = sentence(label, p.message);
        problems << text;
        if (!field.isEmpty() && !fields.contains(field)) fields.insert(field, text);
    }
    if (!problems.isEmpty() || !change.ok()) {
        setProblems(problems, fields);
        setStatus(problems.size() == 1 ? tr("Not saved: one thing to fix.")
                                       : tr("Not saved: %1 things to fix.").arg(problems.size()));
        return false;
    }
    setProblems({}, {});
    const QString title = QString::fromStdString(drill.title);
    if (!change.changed) {
        m_form->markClean();
        setStatus(tr("Nothing changed: the drill already says that."));
        return true;
    }
    if (m_selectedId == 0) {
        m_undo.push_back({UndoStep::Kind::Added, change.id, {}, title, QString::fromStdString(who)});
        setStatus(tr("Added drill %1 “%2”.").arg(change.id).arg(title));
    } else {
        m_undo.push_back({UndoStep::Kind::Edited, change.id, before.value_or(Drill{}), title,
                          QString::fromStdString(who)});
        setStatus(tr("Saved “%1” as version %2.").arg(title).arg(before ? before->versionCount + 1 : 1));
    }
    afterWrite(change.id);
    if (const auto stored = book.get(change.id)) m_form->load(*stored);
    refreshSelection();
    return true;
}

bool DrillBookView::deleteSelected() {
    return guard(tr("Cannot delete the drill"), [&] { return deleteSelectedNow(); });
}

bool DrillBookView::deleteSelectedNow() {
    ClubRepository* repo = repository();
    if (!repo || m_selectedId == 0) return false;
    DrillBook book(*repo);
    const auto drill = book.get(m_selectedId);
    const DrillChange r = book.remove(m_selectedId, nowUtcIso());
    if (!r.ok()) {
        setStatus(sentence({}, r.problems.front().message));
        return false;
    }
    const QString title = drill ? QString::fromStdString(drill->title) : QString();
    m_undo.push_back({UndoStep::Kind::Deleted, m_selectedId, {}, title, {}});
    setStatus(tr("Deleted “%1”. It can be restored at any time, or undone with Ctrl+Z.").arg(title));
    afterWrite(m_selectedId);
    return true;
}

bool DrillBookView::restoreSelected() {
    return guard(tr("Cannot restore the drill"), [&] { return restoreSelectedNow(); });
}

bool DrillBookView::restoreSelectedNow() {
    ClubRepository* repo = repository();
    if (!repo || m_selectedId == 0) return false;
    DrillBook book(*repo);
    const DrillChange r = book.restore(m_selectedId);
    if (!r.ok()) {
        setStatus(sentence({}, r.problems.front().message));
        return false;
    }
    const auto drill = book.get(m_selectedId);
    const QString title = drill ? QString::fromStdString(drill->title) : QString();
    m_undo.push_back({UndoStep::Kind::Restored, m_selectedId, {}, title, {}});
    setStatus(tr("Restored “%1”.").arg(title));
    afterWrite(m_selectedId);
    return true;
}

bool DrillBookView::undo() {
    return guard(tr("Cannot undo"), [&] { return undoNow(); });
}

bool DrillBookView::undoNow() {
    ClubRepository* repo = repository();
    if (!repo || m_undo.empty()) return false;
    const UndoStep step = m_undo.back();
    m_undo.pop_back();
    DrillBook book(*repo);
    const std::string now = nowUtcIso();
    DrillChange r;
    QString done;
    switch (step.kind) {
    case UndoStep::Kind::Added:
        r = book.remove(step.id, now);
        done = tr("Undone: “%1” is deleted again (restorable).").arg(step.title);
        break;
    case UndoStep::Kind::Edited: {
        const std::string who = step.by.isEmpty() ? m_form->savedBy().toStdString() : step.by.toStdString();
        r = book.edit(step.id, step.before, who, now, "undo");
        done = tr("Undone: “%1” says again what it said before the edit (kept as a new version).")
                   .arg(QString::fromStdString(step.before.title));
        break;
    }
    case UndoStep::Kind::Deleted:
        r = book.restore(step.id);
        done = tr("Undone: “%1” is restored.").arg(step.title);
        break;
    case UndoStep::Kind::Restored:
        r = book.remove(step.id, now);
        done = tr("Undone: “%1” is deleted again.").arg(step.title);
        break;
    }
    if (!r.ok()) {
        QStringList reasons;
        for (const auto& p : r.problems) reasons << sentence(fieldLabel(p.field).second, p.message);
        setStatus(tr("Cannot undo: %1").arg(reasons.join(QLatin1Char(' '))));
        emit statusChanged();
        return false;
    }
    setProblems({}, {});
    setStatus(done);
    afterWrite(step.id);
    if (const auto stored = book.get(step.id)) m_form->load(*stored);
    refreshSelection();
    return true;
}

} // namespace pitchloop::desktop
