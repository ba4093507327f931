#pragma once
// The seven days of the planner's week, Monday first: each day's microcycle label and
// intensity cap, the fixture on match days and the session saved for that day.

#include <QAbstractListModel>
#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One day of the week, display-ready.
struct PlanWeekDay {
    QString date;         ///< YYYY-MM-DD
    QString weekday;      ///< "Tue"
    QString dateText;     ///< "29 Sep"
    QString label;        ///< "MD-4", "MD", "MD+1 / MD-3"; empty without fixtures
    bool congested = false;
    int cap = -1;         ///< 0–5; -1 when the day has no microcycle (no fixtures)
    QString capText;      ///< "4 · high", "0 · no session", empty without fixtures
    bool matchDay = false;
    QString fixtureText;  ///< "v Ostry Vale" on match days
    QString fixtureDetail; ///< "Away · 15:00"
    bool hasSession = false;
    QString sessionText;  ///< "90 min · 18 players"
    QStringList drillLines; ///< one a block: "15′ Rondo warm-up"
    bool today = false;
    bool selected = false;
};

/// The week shown by the planner page; rows are replaced whole when the week changes.
class PlanWeekModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The week planner fills its week")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        DateRole = Qt::UserRole + 1,
        WeekdayRole,
        DateTextRole,
        LabelRole,
        CongestedRole,
        CapRole,
        CapTextRole,
        MatchDayRole,
        FixtureTextRole,
        FixtureDetailRole,
        HasSessionRole,
        SessionTextRole,
        DrillLinesRole,
        TodayRole,
        SelectedRole,
    };
    Q_ENUM(Role)

    explicit PlanWeekModel(QObject* parent = nullptr);

    void reset(std::vector<PlanWeekDay> days);
    /// Marks the row of `date` selected (and no other), signalling only the rows that change.
    void select(const QString& date);
    int count() const { return static_cast<int>(m_rows.size()); }
    const std::vector<PlanWeekDay>& rows() const { return m_rows; }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<PlanWeekDay> m_rows;
};

} // namespace pitchloop::desktop
