#pragma once
// Minutes a proposed session gives each open focus, most severe focus first.

#include <QAbstractListModel>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One open focus and the minutes the proposed session gives it, display-ready.
struct PlanFocusRow {
    qint64 focusId = 0;
    QString title;        ///< "Focus 1 · Pre-shot passes against"
    QString zoneText;     ///< "Band 2 · lane 5"
    QString severityText; ///< the zone's state today: "off target", "back on target: no priority"
    int minutes = 0;
    QString minutesText;  ///< "35 min"
    double share = 0;     ///< minutes as a share of the session's minutes, 0–1 (bar length)
};

class PlanFocusModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The week planner fills the minutes per focus")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        FocusIdRole = Qt::UserRole + 1,
        TitleRole,
        ZoneTextRole,
        SeverityTextRole,
        MinutesRole,
        MinutesTextRole,
        ShareRole,
    };
    Q_ENUM(Role)

    explicit PlanFocusModel(QObject* parent = nullptr);

    void reset(std::vector<PlanFocusRow> rows);
    int count() const { return static_cast<int>(m_rows.size()); }
    const std::vector<PlanFocusRow>& rows() const { return m_rows; }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<PlanFocusRow> m_rows;
};

} // namespace pitchloop::desktop
