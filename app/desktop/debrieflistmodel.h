#pragma once
// Debrief items (what slipped, what is on watch, what recovered) as rows with sections.

#include "debrief.h"
#include "metricspec.h"

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include <map>
#include <string>
#include <vector>

namespace pitchloop::desktop {

/// One debrief line, ready for display.
struct DebriefRow {
    QString section; ///< "Off target over the last 5 matches", ...
    QString metricId;
    QString metricName;
    int band = 0;
    int lane = 0;
    QString zoneText;
    QString valueText;
    QString intervalText;
    QString sampleText;
    QString targetText;
    double pMiss = 0;
    QString certaintyText;
    int state = 0; ///< ZoneState::Value
    QString stateText;
    bool isNew = false;    ///< slipped now, not after the previous match
    QString changeText;    ///< "new since KB-2026-33", "was close to the line", ...
    /// The coach's layer: the zone in one plain sentence (model/wording.h).
    QString coachText;
    /// The analyst's layer: the numbers behind the same sentence in one line.
    QString analystText;
};

/// Rows of one debrief section from model items (already ordered by certainty).
std::vector<DebriefRow> debriefRows(const QString& section,
                                    const std::vector<model::DebriefItem>& items,
                                    const std::map<std::string, model::MetricSpec>& metrics,
                                    const model::ZoneGrid& grid,
                                    const std::string& previousMatchId, bool markNew);

/// Debrief items in sections, each ordered by how sure the flag is (P(miss), highest first).
class DebriefListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("Page controllers fill debrief lists")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        SectionRole = Qt::UserRole + 1,
        MetricIdRole,
        MetricNameRole,
        BandRole,
        LaneRole,
        ZoneTextRole,
        ValueTextRole,
        IntervalTextRole,
        SampleTextRole,
        TargetTextRole,
        PMissRole,
        CertaintyTextRole,
        StateRole,
        StateTextRole,
        IsNewRole,
        ChangeTextRole,
        FirstInSectionRole, ///< the first row of its section (the view shows the section title)
        CoachTextRole,      ///< the zone in a plain sentence
        AnalystTextRole,    ///< the numbers behind it in one line
    };
    Q_ENUM(Role)

    explicit DebriefListModel(QObject* parent = nullptr);

    void reset(std::vector<DebriefRow> rows);
    int count() const { return static_cast<int>(m_rows.size()); }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<DebriefRow> m_rows;
};

} // namespace pitchloop::desktop
