#include "drilllistmodel.h"

#include "display.h"

#include <QLocale>

#include <map>

namespace pitchloop::desktop {

using namespace pitchloop::model;

QString intensityText(int level) {
    const std::string_view name = intensityName(level);
    if (name.empty()) return {};
    return QStringLiteral("%1 · %2").arg(level).arg(QString::fromUtf8(name.data(), static_cast<qsizetype>(name.size())));
}

QString playersText(int min, int max) {
    if (min == max) return min == 1 ? QStringLiteral("1 player") : QStringLiteral("%1 players").arg(min);
    return QStringLiteral("%1–%2 players").arg(min).arg(max);
}

QString areaText(double length, double width) {
    if (length == 0 && width == 0) return {};
    return QStringLiteral("%1 × %2 m").arg(QLocale().toString(length, 'g', 4),
                                          QLocale().toString(width, 'g', 4));
}

QString zonesText(const std::vector<Zone>& zones, const ZoneGrid& grid) {
    QStringList parts;
    for (const Zone& z : zones) parts << zoneText(z.band, z.lane, grid);
    return parts.join(QStringLiteral(", "));
}

DrillListModel::DrillListModel(QObject* parent) : QAbstractListModel(parent) {}

void DrillListModel::reset(std::vector<Drill> drills, const ZoneGrid& grid, MetricName metricName) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(drills);
    m_changes.clear();
    m_metricName = std::move(metricName);
    m_grid = grid;
    endResetModel();
    if (before != count()) emit countChanged();
}

namespace {

/// A drills-file key in the words of the editor's fields.
QString fieldWords(const std::string& key) {
    static const std::map<std::string, const char*> words{
        {"title", "title"},           {"purpose", "purpose"},
        {"organisation", "organisation"}, {"coaching_points", "coaching points"},
        {"duration_min", "minutes"},  {"intensity", "intensity"},
        {"players", "players"},       {"area_m", "area"},
        {"equipment", "equipment"},   {"metrics", "metrics"},
        {"zones", "zones"},           {"tags", "tags"},
        {"role", "role"},             {"author", "author"}};
    const auto it = words.find(key);
    return it == words.end() ? QString::fromStdString(key) : QString::fromLatin1(it->second);
}

} // namespace

void DrillListModel::resetVersions(std::vector<Drill> newestFirst, const ZoneGrid& grid,
                                   MetricName metricName) {
    std::vector<QString> changes;
    for (std::size_t i = 0; i < newestFirst.size(); ++i) {
        if (i + 1 == newestFirst.size()) {
            changes.push_back(newestFirst[i].versionCount == 1 ? tr("First version") : QString());
            continue;
        }
        QStringList fields;
        for (const auto& key : changedFields(newestFirst[i + 1], newestFirst[i])) fields << fieldWords(key);
        changes.push_back(fields.isEmpty() ? tr("No change in content")
                                           : tr("Changed: %1").arg(fields.join(QStringLiteral(", "))));
    }
    const int before = count();
    beginResetModel();
    m_rows = std::move(newestFirst);
    m_changes = std::move(changes);
    m_metricName = std::move(metricName);
    m_grid = grid;
    endResetModel();
    if (before != count()) emit countChanged();
}

const Drill* DrillListModel::at(int row) const {
    if (row < 0 || row >= count()) return nullptr;
    return &m_rows[static_cast<std::size_t>(row)];
}

int DrillListModel::indexOf(qint64 drillId) const {
    for (std::size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].id == drillId) return static_cast<int>(i);
    return -1;
}

qint64 DrillListModel::idAt(int row) const {
    const Drill* d = at(row);
    return d ? d->id : 0;
}

QString DrillListModel::metricsText(const Drill& d) const {
    QStringList names;
    for (const auto& m : d.metrics) names << (m_metricName ? m_metricName(m) : QString::fromStdString(m));
    return names.join(QStringLiteral(", "));
}

QString DrillListModel::tagsText(const Drill& d) const {
    QStringList tags;
    for (const auto& t : d.tags) tags << QString::fromStdString(t);
    return tags.join(QStringLiteral(" · "));
}

int DrillListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant DrillListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const Drill& d = m_rows[static_cast<std::size_t>(index.row())];
    const auto text = [](const std::string& s) { return QString::fromStdString(s); };
    switch (role) {
    case Qt::DisplayRole:
    case TitleRole: return text(d.title);
    case DrillIdRole: return static_cast<qint64>(d.id);
    case PurposeRole: return text(d.purpose);
    case MinutesTextRole: return QStringLiteral("%1 min").arg(d.durationMin);
    case IntensityRole: return d.intensity;
    case IntensityTextRole: return intensityText(d.intensity);
    case PlayersTextRole: return playersText(d.playersMin, d.playersMax);
    case AreaTextRole: return areaText(d.areaLengthM, d.areaWidthM);
    case MetricsTextRole: return metricsText(d);
    case WorksOnTextRole: {
        QStringList parts{metricsText(d), tagsText(d)};
        parts.removeAll(QString());
        return parts.join(QStringLiteral("  ·  "));
    }
    case ZonesTextRole: return zonesText(d.zones, m_grid);
    case TagsTextRole: return tagsText(d);
    case AuthorRole: return text(d.author);
    case EditedTextRole:
        return QStringLiteral("Version %1 · %2 · %3")
            .arg(d.versionCount)
            .arg(compactDateText(d.editedAt.substr(0, 10)), text(d.editedBy));
    case VersionRole: return d.versionCount;
    case DeletedRole: return d.deleted;
    case DetailTextRole:
        return QStringLiteral("%1 min · %2 · %3")
            .arg(d.durationMin)
            .arg(intensityText(d.intensity), playersText(d.playersMin, d.playersMax));
    case EditedByRole: return text(d.editedBy);
    case EditedDateTextRole: return compactDateText(d.editedAt.substr(0, 10));
    case ChangesTextRole:
        return static_cast<std::size_t>(index.row()) < m_changes.size()
                   ? m_changes[static_cast<std::size_t>(index.row())]
                   : QString();
    default: return {};
    }
}

QHash<int, QByteArray> DrillListModel::roleNames() const {
    return {{DrillIdRole, "drillId"},       {TitleRole, "title"},
            {PurposeRole, "purpose"},       {MinutesTextRole, "minutesText"},
            {IntensityRole, "intensity"},   {IntensityTextRole, "intensityText"},
            {PlayersTextRole, "playersText"}, {AreaTextRole, "areaText"},
            {MetricsTextRole, "metricsText"}, {ZonesTextRole, "zonesText"},
            {TagsTextRole, "tagsText"},     {AuthorRole, "author"},
            {EditedTextRole, "editedText"}, {VersionRole, "version"},
            {DeletedRole, "deleted"},       {DetailTextRole, "detailText"},
            {EditedByRole, "editedBy"},     {EditedDateTextRole, "editedDateText"},
            {WorksOnTextRole, "worksOnText"}, {ChangesTextRole, "changesText"}};
}

} // namespace pitchloop::desktop
