#pragma once
// A focus's evidence for display: each zone's flag at the match that opened it, in the match
// alone, the club's judged window and the season so far.

#include "focus.h"

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include <string>
#include <vector>

namespace pitchloop::desktop {

/// Rows of model::FocusEvidence in its order; the judged window's rows are marked.
class EvidenceListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The focus page fills its evidence")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        ZoneTextRole = Qt::UserRole + 1,
        WindowTextRole,
        JudgedRole,      ///< the club's judged window (the one that flags)
        ValueTextRole,
        IntervalTextRole, ///< "90% interval 40.1–64.2%"
        SampleTextRole,
        TargetTextRole,  ///< "Target ≥ 55.0%", or "No target"
        ZoneStateRole,   ///< ZoneState::Value
        StateTextRole,
        CertaintyTextRole, ///< "P(miss) 0.97"
        DetailTextRole,  ///< zone, interval and sample in one line
        JudgementTextRole, ///< target, state and P(miss) in one line
    };
    Q_ENUM(Role)

    explicit EvidenceListModel(QObject* parent = nullptr);

    /// `judgedWindow` is the club's judged window name (FlagSettings::window.name()); `grid`
    /// the one the zones are on (a focus's own).
    void reset(const std::vector<model::EvidenceZone>& zones, model::MetricKind kind,
               const std::string& judgedWindow, const model::ZoneGrid& grid);
    int count() const { return static_cast<int>(m_rows.size()); }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    struct Row {
        QString zoneText, windowText;
        bool judged = false;
        QString valueText, intervalText, sampleText, targetText;
        int state = 0;
        QString stateText, certaintyText;
    };
    std::vector<Row> m_rows;
};

} // namespace pitchloop::desktop
