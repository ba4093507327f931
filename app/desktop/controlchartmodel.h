#pragma once
// A review's match-by-match control chart for drawing: each match's value, the centre line and
// 3σ limits from the before window, the EWMA, and which side of the limits a match fell on.

#include "display.h"
#include "focus.h"

#include <QAbstractListModel>
#include <QList>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

/// Points of model::Review::chart (NaN where there is no value), with the axis they are drawn on.
class ControlChartModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The focus page fills its chart")
    Q_PROPERTY(int count READ count NOTIFY changed)
    Q_PROPERTY(QList<double> values READ values NOTIFY changed)
    Q_PROPERTY(QList<double> centres READ centres NOTIFY changed)
    Q_PROPERTY(QList<double> lowerLimits READ lowerLimits NOTIFY changed)
    Q_PROPERTY(QList<double> upperLimits READ upperLimits NOTIFY changed)
    Q_PROPERTY(QList<double> ewmas READ ewmas NOTIFY changed)
    /// Rows before this one are the before window.
    Q_PROPERTY(int firstAfter READ firstAfter NOTIFY changed)
    Q_PROPERTY(double axisLow READ axisLow NOTIFY changed)
    Q_PROPERTY(double axisHigh READ axisHigh NOTIFY changed)
    Q_PROPERTY(QStringList axisLabels READ axisLabels NOTIFY changed)
    /// "p-chart" or "u-chart".
    Q_PROPERTY(QString kindText READ kindText NOTIFY changed)
public:
    enum Role {
        MatchIdRole = Qt::UserRole + 1,
        ShortDateTextRole,
        AfterRole,
        ValueTextRole,
        LimitsTextRole,  ///< "limits 36.8–83.2%"
        CentreTextRole,
        EwmaTextRole,
        SideRole,        ///< -1 beyond the limit on the worse side, 1 on the better side, 0 inside
        SideTextRole,    ///< "above the upper limit (better)", empty inside
    };
    Q_ENUM(Role)

    explicit ControlChartModel(QObject* parent = nullptr);

    /// Fills from a review; the dates come from its before and after windows.
    void reset(const model::Review& review);
    void clear();

    int count() const { return static_cast<int>(m_points.size()); }
    QList<double> values() const;
    QList<double> centres() const;
    QList<double> lowerLimits() const;
    QList<double> upperLimits() const;
    QList<double> ewmas() const;
    int firstAfter() const { return m_firstAfter; }
    double axisLow() const { return m_axis.low; }
    double axisHigh() const { return m_axis.high; }
    QStringList axisLabels() const { return m_axisLabels; }
    QString kindText() const { return m_kindText; }

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

    std::vector<model::ChartPoint> m_points;
    std::vector<std::string> m_dates;
    model::MetricKind m_kind = model::MetricKind::Rate;
    model::Better m_better = model::Better::Higher;
    int m_firstAfter = 0;
    ScaleDomain m_axis;
    QStringList m_axisLabels;
    QString m_kindText;
};

} // namespace pitchloop::desktop
