#pragma once
// Every zone of the grid for the target editor's pitch: the target in force, last season's
// achieved value, and whether the zone is in the editor's selection — all display-ready.

#include <QAbstractListModel>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One zone of the target editor's map.
struct TargetZone {
    int band = 0;
    int lane = 0;
    QString zoneName;       ///< "Our left-back area (B2·L5)"
    bool hasTarget = false;
    QString targetText;     ///< "≥ 45.0%", "no target"
    bool hasLastSeason = false;
    QString lastSeasonText; ///< "41.2%" (last season's achieved value), "–" without items
    bool selected = false;
};

/// The zones of the grid in band-major order.
class TargetZoneModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The target editor fills its zones")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        BandRole = Qt::UserRole + 1,
        LaneRole,
        ZoneNameRole,
        HasTargetRole,
        TargetTextRole,
        HasLastSeasonRole,
        LastSeasonTextRole,
        SelectedRole,
    };
    Q_ENUM(Role)

    explicit TargetZoneModel(QObject* parent = nullptr);

    void reset(std::vector<TargetZone> zones);
    /// Marks the zones for which `isSelected(band, lane)` holds; tells views of changed rows only.
    template <typename Pred> void setSelection(Pred isSelected) {
        for (std::size_t i = 0; i < m_zones.size(); ++i) {
            const bool now = isSelected(m_zones[i].band, m_zones[i].lane);
            if (now == m_zones[i].selected) continue;
            m_zones[i].selected = now;
            const QModelIndex at = index(static_cast<int>(i));
            emit dataChanged(at, at, {SelectedRole});
        }
    }
    int count() const { return static_cast<int>(m_zones.size()); }
    const std::vector<TargetZone>& zones() const { return m_zones; }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<TargetZone> m_zones;
};

} // namespace pitchloop::desktop
