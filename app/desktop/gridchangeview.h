#pragma once
// The zone grid on the settings page: the grid in use, a choice of another one with a sketch
// and a plain-words preview of what moving there does (model::previewGridChange), the move
// itself on a worker thread with progress (every match is counted again), its undo (moving
// back, which restores the earlier grid's targets) and the log of earlier changes.

#include "sessionclient.h"
#include "zones.h"

#include <QString>
#include <QStringList>
#include <QThread>
#include <QtQml/qqmlregistration.h>

#include <optional>
#include <vector>

namespace pitchloop::desktop {

class GridChangeView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    QML_ELEMENT
    /// "6 bands × 5 lanes of equal size (equal:6x5)".
    Q_PROPERTY(QString currentText READ currentText NOTIFY storedChanged)
    /// The grid in use, by name (for a sketch).
    Q_PROPERTY(QString currentName READ currentName NOTIFY storedChanged)

    // The choice: 0 equal sizes, 1 lanes at the area lines (always five lanes).
    Q_PROPERTY(int kind READ kind WRITE setKind NOTIFY choiceChanged)
    Q_PROPERTY(int bands READ bands WRITE setBands NOTIFY choiceChanged)
    Q_PROPERTY(int lanes READ lanes WRITE setLanes NOTIFY choiceChanged)
    Q_PROPERTY(int maxCount READ maxCount CONSTANT)
    /// The chosen grid by name ("markings:6") and in words.
    Q_PROPERTY(QString chosenName READ chosenName NOTIFY choiceChanged)
    Q_PROPERTY(QString chosenText READ chosenText NOTIFY choiceChanged)
    /// What moving to the chosen grid does, one point a line; empty when it is the grid in use.
    Q_PROPERTY(QStringList previewLines READ previewLines NOTIFY choiceChanged)
    /// Who changes it (kept with the change in the club file).
    Q_PROPERTY(QString by READ by WRITE setBy NOTIFY choiceChanged)
    Q_PROPERTY(bool canChange READ canChange NOTIFY choiceChanged)

    Q_PROPERTY(bool running READ running NOTIFY progressChanged)
    Q_PROPERTY(int done READ done NOTIFY progressChanged)
    Q_PROPERTY(int total READ total NOTIFY progressChanged)
    Q_PROPERTY(QString progressText READ progressText NOTIFY progressChanged)

    Q_PROPERTY(QString message READ message NOTIFY resultChanged)
    Q_PROPERTY(QString problems READ problems NOTIFY resultChanged)
    Q_PROPERTY(bool canUndo READ canUndo NOTIFY resultChanged)
    Q_PROPERTY(QString undoText READ undoText NOTIFY resultChanged)
    /// Earlier changes, newest first: "2 Dec 2026 · equal:6x5 → markings:6 by A. Coach: …".
    Q_PROPERTY(QStringList history READ history NOTIFY storedChanged)
public:
    explicit GridChangeView(QObject* parent = nullptr);
    ~GridChangeView() override;

    QString currentText() const { return m_currentText; }
    QString currentName() const { return QString::fromStdString(m_current.name()); }
    int kind() const { return m_kind; }
    void setKind(int kind);
    int bands() const { return m_bands; }
    void setBands(int bands);
    int lanes() const { return m_kind == 1 ? 5 : m_lanes; }
    void setLanes(int lanes);
    int maxCount() const { return 20; }
    QString chosenName() const { return QString::fromStdString(chosen().name()); }
    QString chosenText() const;
    QStringList previewLines() const { return m_previewLines; }
    QString by() const { return m_by; }
    void setBy(const QString& by);
    bool canChange() const;

    bool running() const { return m_thread != nullptr; }
    int done() const { return m_done; }
    int total() const { return m_total; }
    QString progressText() const;

    QString message() const { return m_message; }
    QString problems() const { return m_problems; }
    bool canUndo() const { return !m_undo.empty() && !running(); }
    QString undoText() const;
    QStringList history() const { return m_history; }

    /// Moves the club to the chosen grid on a worker thread; false (with `problems`) when it
    /// cannot start. `finished` follows; every page recomputes on the new grid.
    Q_INVOKABLE bool change();
    /// Moves back to the grid before the last change made here.
    Q_INVOKABLE bool undo();
    /// Puts the grid in use back in the choice.
    Q_INVOKABLE void resetChoice();

    /// Blocks until a running change has ended (tests, and the page closing).
    void waitForWorker();

signals:
    void storedChanged();
    void choiceChanged();
    void progressChanged();
    void resultChanged();
    void finished();

protected:
    void refresh() override;

private:
    model::ZoneGrid chosen() const;
    void updatePreview();
    bool start(const model::ZoneGrid& to, const QString& by, bool isUndo);
    void workerDone(const QString& fault, int carried, bool isUndo);
    void setResult(const QString& problems, const QString& message);

    const void* m_repoSeen = nullptr;
    model::ZoneGrid m_current;
    model::ZoneGrid m_target; ///< where the running change goes
    model::ZoneGrid m_from;   ///< where it comes from
    QString m_currentText;
    int m_kind = 0;
    int m_bands = 6;
    int m_lanes = 5;
    QString m_by;
    QStringList m_previewLines;
    QStringList m_history;
    QThread* m_thread = nullptr;
    int m_done = 0;
    int m_total = 0;
    QString m_message;
    QString m_problems;
    std::vector<model::ZoneGrid> m_undo; ///< grids before each change made here, latest last
    QString m_undoBy;
};

} // namespace pitchloop::desktop
