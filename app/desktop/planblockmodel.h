#pragma once
// The blocks of a proposed training session, in the planner's order (warm-up, main drills,
// cool-down), each with its one-line reason.

#include <QAbstractListModel>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One block of a proposed session, display-ready.
struct PlanBlockRow {
    QString role;          ///< "Warm-up", "Main", "Cool-down"
    bool main = false;     ///< a main drill (warm-ups and cool-downs cannot be swapped for one)
    qint64 drillId = 0;
    QString title;
    int minutes = 0;
    QString minutesText;   ///< "15 min"
    int intensity = 0;
    QString intensityText; ///< "3 · moderate"
    bool pinned = false;
    QString focusText;     ///< "Focus 1 · Pre-shot passes against · band 2 · lane 5"; empty
    QString why;           ///< the planner's one line
};

class PlanBlockModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The week planner fills the proposed session")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        RoleTextRole = Qt::UserRole + 1,
        MainRole,
        DrillIdRole,
        TitleRole,
        MinutesRole,
        MinutesTextRole,
        IntensityRole,
        IntensityTextRole,
        PinnedRole,
        FocusTextRole,
        WhyRole,
    };
    Q_ENUM(Role)

    explicit PlanBlockModel(QObject* parent = nullptr);

    void reset(std::vector<PlanBlockRow> rows);
    int count() const { return static_cast<int>(m_rows.size()); }
    const std::vector<PlanBlockRow>& rows() const { return m_rows; }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<PlanBlockRow> m_rows;
};

} // namespace pitchloop::desktop
