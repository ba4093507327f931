#pragma once
// The club's focuses for a list, with each one's state, progress towards its review point and
// training time so far, display-ready; and the focus states as a QML enum.

#include <QAbstractListModel>
#include <QObject>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// The states of model::FocusState as a QML enum (FocusPhase.Open, ...).
class FocusPhase : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("FocusPhase only names the states of a focus")
public:
    enum Value { Open, DueForReview, Closed };
    Q_ENUM(Value)
};

/// One focus, ready for display.
struct FocusRow {
    qint64 focusId = 0;
    QString title;        ///< the metric's name
    QString zonesText;
    int phase = FocusPhase::Open;
    QString phaseText;    ///< "Open", "Due for review", "Closed · worked"
    QString openedText;   ///< "After KB-2026-08 · 26 Sep 2026 · D. Arkwright"
    QString progressText; ///< "3 of 5 matches played since 27 Sep 2026"
    QString drillsText;   ///< "3 drills linked"
    QString minutesText;  ///< "320 min of training so far"
};

/// Focuses, newest first.
class FocusListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The focus page fills its list")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        FocusIdRole = Qt::UserRole + 1,
        TitleRole,
        ZonesTextRole,
        PhaseRole,
        PhaseTextRole,
        OpenedTextRole,
        ProgressTextRole,
        DrillsTextRole,
        MinutesTextRole,
    };
    Q_ENUM(Role)

    explicit FocusListModel(QObject* parent = nullptr);

    void reset(std::vector<FocusRow> rows);
    int count() const { return static_cast<int>(m_rows.size()); }
    const FocusRow* at(int row) const;
    Q_INVOKABLE int indexOf(qint64 focusId) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<FocusRow> m_rows;
};

} // namespace pitchloop::desktop
