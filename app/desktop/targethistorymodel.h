#pragma once
// Every stored version of one target (a metric in a zone for a season), newest first, for the
// target editor's history: when, who, the rule, why, and which version is in force.

#include "targets.h"

#include <QAbstractListModel>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One stored version, display-ready.
struct TargetHistoryRow {
    QString recordedText;  ///< "2 Dec 2026, 01:04 UTC"
    QString effectiveText; ///< "from 1 Jul 2026"
    QString author;
    QString ruleText;      ///< "≥ 45.0% · margin 5.0% · at least 30 items", or "Retired"
    QString rationale;
    bool retired = false;
    bool inForce = false;
};

/// Rows for the versions of one target; the caller orders them and marks the one in force.
std::vector<TargetHistoryRow> historyRows(const std::vector<model::Target>& versions,
                                          model::MetricKind kind, const std::string& asOf);

class TargetHistoryModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The target editor fills its history")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        RecordedTextRole = Qt::UserRole + 1,
        EffectiveTextRole,
        AuthorRole,
        RuleTextRole,
        RationaleRole,
        RetiredRole,
        InForceRole,
    };
    Q_ENUM(Role)

    explicit TargetHistoryModel(QObject* parent = nullptr);

    void reset(std::vector<TargetHistoryRow> rows);
    int count() const { return static_cast<int>(m_rows.size()); }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<TargetHistoryRow> m_rows;
};

} // namespace pitchloop::desktop
