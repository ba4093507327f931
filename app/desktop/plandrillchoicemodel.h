#pragma once
// The drills a coach can bring into a proposed session in place of another: the live drills of
// the drill book, with how each sits against the chosen day's intensity cap.

#include <QAbstractListModel>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One drill of the book as a swap choice, display-ready.
struct PlanDrillChoice {
    qint64 drillId = 0;
    QString title;
    QString detailText; ///< "20 min · intensity 3 · moderate · 8–16 players"
    QString label;      ///< "Rondo 5v2 — 20 min, intensity 3" (for a picker's one line)
    bool aboveCap = false;
    bool inPlan = false; ///< already a block of the proposed session
};

class PlanDrillChoiceModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The week planner lists the drills to swap in")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        DrillIdRole = Qt::UserRole + 1,
        TitleRole,
        DetailTextRole,
        LabelRole,
        AboveCapRole,
        InPlanRole,
    };
    Q_ENUM(Role)

    explicit PlanDrillChoiceModel(QObject* parent = nullptr);

    void reset(std::vector<PlanDrillChoice> rows);
    int count() const { return static_cast<int>(m_rows.size()); }
    const std::vector<PlanDrillChoice>& rows() const { return m_rows; }
    /// Drill id at a row, 0 when out of range.
    Q_INVOKABLE qint64 idAt(int row) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<PlanDrillChoice> m_rows;
};

} // namespace pitchloop::desktop
