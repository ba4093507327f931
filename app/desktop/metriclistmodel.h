#pragma once
// The club's metrics for pickers: id, name, the question it answers, its kind.

#include "metricspec.h"

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// Metrics of the club file in their stored order.
class MetricListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The club session lists the metrics")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        MetricIdRole = Qt::UserRole + 1,
        NameRole,
        QuestionRole,
        KindRole,   ///< "share of items", "count a match", "per exposure event"
        BetterRole, ///< "Higher is better" / "Lower is better"
    };
    Q_ENUM(Role)

    explicit MetricListModel(QObject* parent = nullptr);

    void reset(const std::vector<model::MetricSpec>& metrics);
    int count() const { return static_cast<int>(m_rows.size()); }
    /// Row of a metric id, -1 when absent.
    Q_INVOKABLE int indexOf(const QString& metricId) const;
    /// Metric id at a row, empty when out of range.
    Q_INVOKABLE QString idAt(int row) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<model::MetricSpec> m_rows;
};

} // namespace pitchloop::desktop
