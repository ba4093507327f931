#pragma once
// The drill editor's form: every field of a drill as the user types it (texts, not yet
// numbers), so nothing typed is lost when a save is refused.

#include "drills.h"

#include <QObject>
#include <QString>
#include <QStringList>
#include <QVariantList>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

/// One drill being written. Lists are typed as text: coaching points one a line, equipment and
/// tags separated by commas. `dirty` until loaded or saved.
class DrillForm : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The drill book page owns its form")
    Q_PROPERTY(QString title READ title WRITE setTitle NOTIFY changed)
    Q_PROPERTY(QString purpose READ purpose WRITE setPurpose NOTIFY changed)
    Q_PROPERTY(QString organisation READ organisation WRITE setOrganisation NOTIFY changed)
    Q_PROPERTY(QString coachingPoints READ coachingPoints WRITE setCoachingPoints NOTIFY changed)
    Q_PROPERTY(QString minutes READ minutes WRITE setMinutes NOTIFY changed)
    Q_PROPERTY(int intensity READ intensity WRITE setIntensity NOTIFY changed)
    Q_PROPERTY(QString playersMin READ playersMin WRITE setPlayersMin NOTIFY changed)
    Q_PROPERTY(QString playersMax READ playersMax WRITE setPlayersMax NOTIFY changed)
    Q_PROPERTY(QString areaLength READ areaLength WRITE setAreaLength NOTIFY changed)
    Q_PROPERTY(QString areaWidth READ areaWidth WRITE setAreaWidth NOTIFY changed)
    Q_PROPERTY(QString equipment READ equipment WRITE setEquipment NOTIFY changed)
    Q_PROPERTY(QStringList metrics READ metrics WRITE setMetrics NOTIFY changed)
    /// Chosen zones as {band, lane} maps, in the order chosen.
    Q_PROPERTY(QVariantList zones READ zones NOTIFY changed)
    Q_PROPERTY(QString zonesText READ zonesText NOTIFY changed)
    Q_PROPERTY(QString tags READ tags WRITE setTags NOTIFY changed)
    /// Its part in a session: 0 from the tags, 1 warm-up, 2 main, 3 cool-down.
    Q_PROPERTY(int role READ role WRITE setRole NOTIFY changed)
    Q_PROPERTY(QString author READ author WRITE setAuthor NOTIFY changed)
    /// Who writes this version (recorded with it; the drill's author stays as it is).
    Q_PROPERTY(QString savedBy READ savedBy WRITE setSavedBy NOTIFY changed)
    Q_PROPERTY(bool dirty READ dirty NOTIFY changed)
public:
    explicit DrillForm(QObject* parent = nullptr);

    QString title() const { return m_title; }
    void setTitle(const QString& v) { set(m_title, v); }
    QString purpose() const { return m_purpose; }
    void setPurpose(const QString& v) { set(m_purpose, v); }
    QString organisation() const { return m_organisation; }
    void setOrganisation(const QString& v) { set(m_organisation, v); }
    QString coachingPoints() const { return m_points; }
    void setCoachingPoints(const QString& v) { set(m_points, v); }
    QString minutes() const { return m_minutes; }
    void setMinutes(const QString& v) { set(m_minutes, v); }
    int intensity() const { return m_intensity; }
    void setIntensity(int v);
    QString playersMin() const { return m_playersMin; }
    void setPlayersMin(const QString& v) { set(m_playersMin, v); }
    QString playersMax() const { return m_playersMax; }
    void setPlayersMax(const QString& v) { set(m_playersMax, v); }
    QString areaLength() const { return m_areaLength; }
    void setAreaLength(const QString& v) { set(m_areaLength, v); }
    QString areaWidth() const { return m_areaWidth; }
    void setAreaWidth(const QString& v) { set(m_areaWidth, v); }
    QString equipment() const { return m_equipment; }
    void setEquipment(const QString& v) { set(m_equipment, v); }
    QStringList metrics() const { return m_metrics; }
    void setMetrics(const QStringList& v);
    QVariantList zones() const;
    QString zonesText() const;
    QString tags() const { return m_tags; }
    void setTags(const QString& v) { set(m_tags, v); }
    int role() const { return m_role; }
    void setRole(int v);
    QString author() const { return m_author; }
    void setAuthor(const QString& v) { set(m_author, v); }
    QString savedBy() const { return m_savedBy; }
    void setSavedBy(const QString& v) { set(m_savedBy, v); }
    bool dirty() const { return m_dirty; }

    /// Adds the metric when it is not chosen, else removes it.
    Q_INVOKABLE void toggleMetric(const QString& metricId);
    Q_INVOKABLE bool hasMetric(const QString& metricId) const { return m_metrics.contains(metricId); }
    /// Adds the zone when it is not chosen, else removes it.
    Q_INVOKABLE void toggleZone(int band, int lane);
    Q_INVOKABLE bool hasZone(int band, int lane) const;

    /// Fills every field from a stored drill (savedBy is kept) and marks the form clean.
    void load(const model::Drill& drill);
    /// Empties every field but savedBy; intensity 3, and marks the form clean.
    void clear();
    void markClean();
    /// The club's grid, which the zones are on (their names follow it).
    void setGrid(const model::ZoneGrid& grid);

    /// A problem with what was typed, before the drill book sees it: the form field (property
    /// name) and a sentence naming it.
    struct Problem {
        QString field;
        QString message;
    };
    /// The drill the fields describe. Numbers that cannot be read are reported and left 0 (so
    /// the book's own check also names the field); empty lines and list items are dropped.
    model::Drill toDrill(std::vector<Problem>& problems) const;

signals:
    void changed();

private:
    void set(QString& field, const QString& value);

    QString m_title, m_purpose, m_organisation, m_points, m_minutes;
    int m_intensity = 3;
    QString m_playersMin, m_playersMax, m_areaLength, m_areaWidth, m_equipment;
    QStringList m_metrics;
    std::vector<model::Zone> m_zones;
    model::ZoneGrid m_grid;
    QString m_tags, m_author, m_savedBy;
    int m_role = 0;
    bool m_dirty = false;
};

} // namespace pitchloop::desktop
