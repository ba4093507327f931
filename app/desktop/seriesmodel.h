#pragma once
// One zone's match-by-match series for one metric: the match's own value, the judged window's
// value and interval, the EWMA and the target in force, one row per match of the season.

#include "display.h"

#include <QAbstractListModel>
#include <QList>
#include <QStringList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One match of a zone's series, ready for display and drawing (NaN where there is no value).
struct SeriesPoint {
    QString matchId;
    QString opponent;
    QString dateText;
    QString shortDateText;
    double value = 0;       ///< this match alone
    QString valueText;
    QString sampleText;
    double windowValue = 0; ///< the judged window ending at this match
    double low = 0;         ///< its interval
    double high = 0;
    QString windowText;     ///< "52.3% (40.1–64.2%) · n = 44"
    double ewma = 0;
    QString ewmaText;
    double target = 0;
    QString targetText;
    int state = 0;          ///< ZoneState::Value in the judged window
    QString stateText;
    QString certaintyText;
};

/// A zone's series, oldest match first, with the value axis it is drawn on.
class SeriesModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The zone trend fills its series")
    Q_PROPERTY(int count READ count NOTIFY changed)
    Q_PROPERTY(QList<double> values READ values NOTIFY changed)
    Q_PROPERTY(QList<double> lows READ lows NOTIFY changed)
    Q_PROPERTY(QList<double> highs READ highs NOTIFY changed)
    Q_PROPERTY(QList<double> ewmas READ ewmas NOTIFY changed)
    Q_PROPERTY(QList<double> targets READ targets NOTIFY changed)
    Q_PROPERTY(double axisLow READ axisLow NOTIFY changed)
    Q_PROPERTY(double axisHigh READ axisHigh NOTIFY changed)
    /// Axis labels, evenly spaced from axisLow to axisHigh.
    Q_PROPERTY(QStringList axisLabels READ axisLabels NOTIFY changed)
public:
    enum Role {
        MatchIdRole = Qt::UserRole + 1,
        OpponentRole,
        DateTextRole,
        ShortDateTextRole,
        HasValueRole,
        ValueRole,
        ValueTextRole,
        SampleTextRole,
        WindowValueRole,
        LowRole,
        HighRole,
        WindowTextRole,
        EwmaRole,
        EwmaTextRole,
        HasTargetRole,
        TargetRole,
        TargetTextRole,
        StateRole,
        StateTextRole,
        CertaintyTextRole,
    };
    Q_ENUM(Role)

    explicit SeriesModel(QObject* parent = nullptr);

    void reset(std::vector<SeriesPoint> points, const ScaleDomain& axis, QStringList labels);
    int count() const { return static_cast<int>(m_points.size()); }
    QList<double> values() const;
    QList<double> lows() const;
    QList<double> highs() const;
    QList<double> ewmas() const;
    QList<double> targets() const;
    double axisLow() const { return m_axis.low; }
    double axisHigh() const { return m_axis.high; }
    QStringList axisLabels() const { return m_axisLabels; }

    /// The roles of one row by name (empty when out of range).
    Q_INVOKABLE QVariantMap point(int row) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void changed();

private:
    template <typename F>
    QList<double> column(F f) const;
    std::vector<SeriesPoint> m_points;
    ScaleDomain m_axis;
    QStringList m_axisLabels;
};

} // namespace pitchloop::desktop
