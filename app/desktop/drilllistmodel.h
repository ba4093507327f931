#pragma once
// Drills of the drill book for lists and pickers: title, length, intensity, players, what they
// work on and their book-keeping, as display-ready roles.

#include "drills.h"

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include <functional>
#include <vector>

namespace pitchloop::desktop {

/// A list of drills (latest versions, or the versions of one drill), in the order given.
class DrillListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("Page controllers fill drill lists")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        DrillIdRole = Qt::UserRole + 1,
        TitleRole,
        PurposeRole,
        MinutesTextRole,  ///< "18 min"
        IntensityRole,    ///< 1–5
        IntensityTextRole, ///< "4 · high"
        PlayersTextRole,  ///< "6–10 players"
        AreaTextRole,     ///< "35 × 25 m", empty without an area
        MetricsTextRole,  ///< metric names, joined
        ZonesTextRole,
        TagsTextRole,
        AuthorRole,
        EditedTextRole,   ///< "Version 3 · 2 Oct 2026 · L. Farrant"
        VersionRole,
        DeletedRole,
        DetailTextRole,   ///< "18 min · 4 · high · 6–10 players"
        EditedByRole,     ///< who wrote this version
        EditedDateTextRole, ///< "2 Oct 2026"
        WorksOnTextRole,  ///< metric names and tags in one line
        /// In a list of one drill's versions: "First version" or "Changed: title, minutes"
        /// against the version before it; empty in other lists.
        ChangesTextRole,
    };
    Q_ENUM(Role)

    /// Turns a metric id into the name people read.
    using MetricName = std::function<QString(const std::string&)>;

    explicit DrillListModel(QObject* parent = nullptr);

    /// Drills whose zones lie on `grid` (the club's).
    void reset(std::vector<model::Drill> drills, const model::ZoneGrid& grid, MetricName metricName = {});
    /// One drill's versions, newest first; each row also says what it changed.
    void resetVersions(std::vector<model::Drill> newestFirst, const model::ZoneGrid& grid,
                       MetricName metricName = {});
    int count() const { return static_cast<int>(m_rows.size()); }
    const model::Drill* at(int row) const;
    /// Row of a drill id, -1 when absent.
    Q_INVOKABLE int indexOf(qint64 drillId) const;
    /// Drill id at a row, 0 when out of range.
    Q_INVOKABLE qint64 idAt(int row) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    QString metricsText(const model::Drill& d) const;
    QString tagsText(const model::Drill& d) const;

    std::vector<model::Drill> m_rows;
    std::vector<QString> m_changes; ///< per row, for a list of versions
    MetricName m_metricName;
    model::ZoneGrid m_grid;
};

/// "4 · high"; empty outside 1–5.
QString intensityText(int level);
/// "6–10 players", "8 players".
QString playersText(int min, int max);
/// "35 × 25 m", empty without an area.
QString areaText(double length, double width);
/// "Our left-back area (B2·L5), In front of our box (B2·L3)".
QString zonesText(const std::vector<model::Zone>& zones, const model::ZoneGrid& grid);

} // namespace pitchloop::desktop
