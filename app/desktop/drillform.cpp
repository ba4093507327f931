#include "drillform.h"

#include "drilllistmodel.h"

#include <QLocale>
#include <QVariantMap>

#include <algorithm>
#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString numberText(double v) {
    return v == 0 ? QString() : QString::number(v, 'g', 6);
}

/// The non-empty, trimmed parts of `text` split at `separator`.
std::vector<std::string> parts(const QString& text, QChar separator) {
    std::vector<std::string> out;
    for (const QString& part : text.split(separator)) {
        const QString t = part.trimmed();
        if (!t.isEmpty()) out.push_back(t.toStdString());
    }
    return out;
}

QString joined(const std::vector<std::string>& items, const QString& separator) {
    QStringList list;
    for (const auto& s : items) list << QString::fromStdString(s);
    return list.join(separator);
}

} // namespace

DrillForm::DrillForm(QObject* parent) : QObject(parent) {}

void DrillForm::set(QString& field, const QString& value) {
    if (field == value) return;
    field = value;
    m_dirty = true;
    emit changed();
}

void DrillForm::setRole(int v) {
    if (m_role == v || v < 0 || v > 3) return;
    m_role = v;
    m_dirty = true;
    emit changed();
}

void DrillForm::setIntensity(int v) {
    if (m_intensity == v) return;
    m_intensity = v;
    m_dirty = true;
    emit changed();
}

void DrillForm::setMetrics(const QStringList& v) {
    if (m_metrics == v) return;
    m_metrics = v;
    m_dirty = true;
    emit changed();
}

QVariantList DrillForm::zones() const {
    QVariantList out;
    for (const Zone& z : m_zones)
        out << QVariantMap{{QStringLiteral("band"), z.band}, {QStringLiteral("lane"), z.lane}};
    return out;
}

QString DrillForm::zonesText() const { return desktop::zonesText(m_zones, m_grid); }

void DrillForm::setGrid(const ZoneGrid& grid) {
    if (grid == m_grid) return;
    m_grid = grid;
    emit changed();
}

void DrillForm::toggleMetric(const QString& metricId) {
    QStringList next = m_metrics;
    if (!next.removeOne(metricId)) next << metricId;
    setMetrics(next);
}

bool DrillForm::hasZone(int band, int lane) const {
    return std::find(m_zones.begin(), m_zones.end(), Zone{band, lane}) != m_zones.end();
}

void DrillForm::toggleZone(int band, int lane) {
    const auto it = std::find(m_zones.begin(), m_zones.end(), Zone{band, lane});
    if (it != m_zones.end()) m_zones.erase(it);
    else m_zones.push_back({band, lane});
    m_dirty = true;
    emit changed();
}

void DrillForm::load(const Drill& d) {
    const auto text = [](const std::string& s) { return QString::fromStdString(s); };
    m_title = text(d.title);
    m_purpose = text(d.purpose);
    m_organisation = text(d.organisation);
    m_points = joined(d.coachingPoints, QStringLiteral("\n"));
    m_minutes = d.durationMin > 0 ? QString::number(d.durationMin) : QString();
    m_intensity = d.intensity;
    m_playersMin = d.playersMin > 0 ? QString::number(d.playersMin) : QString();
    m_playersMax = d.playersMax > 0 ? QString::number(d.playersMax) : QString();
    m_areaLength = numberText(d.areaLengthM);
    m_areaWidth = numberText(d.areaWidthM);
    m_equipment = joined(d.equipment, QStringLiteral(", "));
    m_metrics.clear();
    for (const auto& m : d.metrics) m_metrics << text(m);
    m_zones = d.zones;
    m_tags = joined(d.tags, QStringLiteral(", "));
    m_role = static_cast<int>(d.role);
    m_author = text(d.author);
    m_dirty = false;
    emit changed();
}

void DrillForm::clear() {
    Drill empty;
    empty.intensity = 3;
    load(empty);
}

void DrillForm::markClean() {
    if (!m_dirty) return;
    m_dirty = false;
    emit changed();
}

Drill DrillForm::toDrill(std::vector<Problem>& problems) const {
    Drill d;
    d.title = m_title.trimmed().toStdString();
    d.purpose = m_purpose.trimmed().toStdString();
    d.organisation = m_organisation.trimmed().toStdString();
    d.coachingPoints = parts(m_points, QLatin1Char('\n'));
    d.intensity = m_intensity;
    d.equipment = parts(m_equipment, QLatin1Char(','));
    d.tags = parts(m_tags, QLatin1Char(','));
    d.role = static_cast<DrillRole>(m_role);
    for (const QString& m : m_metrics) d.metrics.push_back(m.toStdString());
    d.zones = m_zones;
    d.author = m_author.trimmed().toStdString();

    const auto whole = [&](const QString& field, const QString& label, const QString& typed) {
        const QString t = typed.trimmed();
        if (t.isEmpty()) return 0; // the book's check says what is expected
        bool ok = false;
        const int v = QLocale().toInt(t, &ok);
        const int c = ok ? v : t.toInt(&ok);
        if (!ok) {
            problems.push_back({field, tr("%1: “%2” is not a whole number.").arg(label, t)});
            return 0;
        }
        return c;
    };
    const auto metres = [&](const QString& field, const QString& label, const QString& typed) {
        const QString t = typed.trimmed();
        if (t.isEmpty()) return 0.0;
        bool ok = false;
        double v = QLocale().toDouble(t, &ok);
        if (!ok) v = t.toDouble(&ok);
        if (!ok || !std::isfinite(v)) {
            problems.push_back({field, tr("%1: “%2” is not a number of metres.").arg(label, t)});
            return 0.0;
        }
        return v;
    };
    d.durationMin = whole(QStringLiteral("minutes"), tr("Minutes"), m_minutes);
    d.playersMin = whole(QStringLiteral("playersMin"), tr("Fewest players"), m_playersMin);
    d.playersMax = whole(QStringLiteral("playersMax"), tr("Most players"), m_playersMax);
    d.areaLengthM = metres(QStringLiteral("areaLength"), tr("Area length"), m_areaLength);
    d.areaWidthM = metres(QStringLiteral("areaWidth"), tr("Area width"), m_areaWidth);
    if ((d.areaLengthM == 0) != (d.areaWidthM == 0) &&
        (m_areaLength.trimmed().isEmpty() || m_areaWidth.trimmed().isEmpty()))
        problems.push_back({m_areaLength.trimmed().isEmpty() ? QStringLiteral("areaLength")
                                                             : QStringLiteral("areaWidth"),
                            tr("Area: give both length and width, or neither.")});
    return d;
}

} // namespace pitchloop::desktop
