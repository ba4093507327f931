#pragma once
// What loading each match file came to, one row a file, display-ready: stored, replaced,
// unchanged, failed (with every problem) or not loaded (the load was cancelled first).

#include <QAbstractListModel>
#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One match file's outcome.
struct ImportResult {
    enum Outcome { Stored, Replaced, Unchanged, Failed, NotLoaded };
    QString fileName;  ///< "KB-2026-01.json"
    QString path;      ///< as given
    Outcome outcome = Failed;
    QString matchId;   ///< empty when the file could not be read as a match
    QString matchDate; ///< ISO date, to find the newest match loaded
    QString detail;    ///< "Sat 8 Aug 2026 v Nettleby Town · 1,943 events"
    QStringList problems; ///< Problem::describe() of each error, one line each
    QStringList warnings;
};

/// The files of one load, in the order they were taken.
class ImportResultModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The import page fills its results")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Outcome {
        Stored = ImportResult::Stored,
        Replaced = ImportResult::Replaced,
        Unchanged = ImportResult::Unchanged,
        Failed = ImportResult::Failed,
        NotLoaded = ImportResult::NotLoaded,
    };
    Q_ENUM(Outcome)

    enum Role {
        FileNameRole = Qt::UserRole + 1,
        PathRole,
        OutcomeRole,
        OutcomeTextRole, ///< "Stored", "Replaced", "Unchanged", "Failed", "Not loaded"
        MatchIdRole,
        DetailRole,
        ProblemsRole,    ///< QStringList
        ProblemTextRole, ///< the problems one a line
        WarningTextRole, ///< the warnings one a line
    };
    Q_ENUM(Role)

    explicit ImportResultModel(QObject* parent = nullptr);

    void append(ImportResult result);
    void clear();
    int count() const { return static_cast<int>(m_rows.size()); }
    const std::vector<ImportResult>& rows() const { return m_rows; }
    /// How many rows have this outcome.
    int countOf(ImportResult::Outcome outcome) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<ImportResult> m_rows;
};

/// "Stored", "Replaced", "Unchanged", "Failed", "Not loaded".
QString outcomeText(ImportResult::Outcome outcome);

} // namespace pitchloop::desktop
