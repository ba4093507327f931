#pragma once
// Loading match files into the open club file (the import page): files or folders in, ingested
// one by one on a worker thread with its own connection to the club file, each in its own
// transaction, with progress, cancel after the current file, and every file's outcome.

#include "sessionclient.h"

#include <QList>
#include <QString>
#include <QStringList>
#include <QThread>
#include <QUrl>
#include <QVariantList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <atomic>
#include <memory>

namespace pitchloop::desktop {

class ImportResultModel;
struct ImportResult;

/// Give it files (urls from a drop or a file dialog, or paths); it loads them off the window's
/// thread, fills `results` file by file, and reloads the session when done.
class ImportView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("importresultmodel.h")
    QML_ELEMENT
    Q_PROPERTY(bool running READ running NOTIFY runningChanged)
    Q_PROPERTY(bool cancelling READ cancelling NOTIFY progressChanged)
    Q_PROPERTY(int total READ total NOTIFY progressChanged)
    Q_PROPERTY(int done READ done NOTIFY progressChanged)
    /// done / total, 0..1.
    Q_PROPERTY(double progress READ progress NOTIFY progressChanged)
    Q_PROPERTY(QString currentFile READ currentFile NOTIFY progressChanged)
    /// "3 of 34 files · KB-2026-04.json" while running.
    Q_PROPERTY(QString progressText READ progressText NOTIFY progressChanged)
    /// Replace a stored match whose file has changed (otherwise such a file fails).
    Q_PROPERTY(bool replace READ replace WRITE setReplace NOTIFY replaceChanged)
    /// Whether files can be loaded into the open club file (it must be a file on disk).
    Q_PROPERTY(bool canLoad READ canLoad NOTIFY canLoadChanged)
    Q_PROPERTY(QString clubFileText READ clubFileText NOTIFY canLoadChanged)
    /// After a load: what came of it in one sentence; before or on refusal: why nothing ran.
    Q_PROPERTY(QString summaryText READ summaryText NOTIFY summaryChanged)
    Q_PROPERTY(bool hasFailures READ hasFailures NOTIFY summaryChanged)
    /// The newest match (by date) stored by the last load, empty when none.
    Q_PROPERTY(QString latestMatchId READ latestMatchId NOTIFY summaryChanged)
    Q_PROPERTY(QString latestMatchText READ latestMatchText NOTIFY summaryChanged)
    Q_PROPERTY(pitchloop::desktop::ImportResultModel* results READ results CONSTANT)
    /// The table layouts saved in the club file: [{name, savedAt, columnsText}], by name.
    Q_PROPERTY(QVariantList layouts READ layouts NOTIFY layoutsChanged)
public:
    explicit ImportView(QObject* parent = nullptr);
    ~ImportView() override;

    bool running() const { return m_running; }
    bool cancelling() const { return m_cancel && m_cancel->load(); }
    int total() const { return static_cast<int>(m_paths.size()); }
    int done() const { return m_done; }
    double progress() const { return total() > 0 ? static_cast<double>(m_done) / total() : 0; }
    QString currentFile() const { return m_currentFile; }
    QString progressText() const;
    bool replace() const { return m_replace; }
    void setReplace(bool replace);
    bool canLoad() const { return m_canLoad; }
    QString clubFileText() const { return m_clubFile; }
    QString summaryText() const { return m_summary; }
    bool hasFailures() const;
    QString latestMatchId() const { return m_latestMatchId; }
    QString latestMatchText() const { return m_latestMatchText; }
    ImportResultModel* results() const { return m_results; }
    QVariantList layouts() const { return m_layouts; }

    /// Loads files and folders (every .json file inside, sorted, subfolders too) given as
    /// local-file urls. Returns false, with the reason in summaryText, when nothing starts.
    Q_INVOKABLE bool loadUrls(const QList<QUrl>& urls);
    /// The same with paths. A table no saved layout reads is left out of the load and
    /// handed to the mapping assistant (layoutNeeded), the first such table only.
    Q_INVOKABLE bool loadPaths(const QStringList& paths);
    /// Loads tables with match details they do not give themselves (the assistant's form:
    /// id, date, opponent, venue).
    Q_INVOKABLE bool loadWithDetails(const QStringList& paths, const QVariantMap& details);
    /// Reads the saved layouts again (after the assistant saved one).
    Q_INVOKABLE void readLayouts();
    /// Removes a saved layout; files already loaded with it stay as they are.
    Q_INVOKABLE bool removeLayout(const QString& name);
    /// Saves a copy of a layout as "NAME (copy)" (or "(copy 2)"…); returns the new name.
    Q_INVOKABLE QString duplicateLayout(const QString& name);
    /// Stops after the file being loaded now; the rest are listed as not loaded.
    Q_INVOKABLE void cancel();
    /// Saves a mapping profile file (docs/import.md) in the club file under its own name (or
    /// the file's): tables in its layout then load on drop. Says what happened in the summary.
    Q_INVOKABLE bool saveLayout(const QUrl& profileFile);

    /// The .json files a list of files and folders stands for, in load order.
    static QStringList expandPaths(const QStringList& paths);

signals:
    void runningChanged();
    void progressChanged();
    void replaceChanged();
    void canLoadChanged();
    void summaryChanged();
    /// A load ended (all files done, or cancelled) and the session has been reloaded.
    void finished();
    void layoutsChanged();
    /// A table in a layout no saved one reads: open the mapping assistant on it.
    void layoutNeeded(const QString& path);

protected:
    void refresh() override;

private:
    void fileStarted(int index, const QString& name);
    void fileDone(ImportResult result);
    void workerDone(const QString& fault);
    void setSummary(const QString& text);
    bool start(const QStringList& paths, const QVariantMap& details);

    ImportResultModel* m_results;
    QThread* m_thread = nullptr;
    std::shared_ptr<std::atomic<bool>> m_cancel;
    QStringList m_paths;
    int m_done = 0;
    bool m_running = false;
    QString m_currentFile;
    bool m_replace = false;
    bool m_canLoad = false;
    QString m_clubFile;
    QString m_summary;
    QString m_latestMatchId;
    QString m_latestMatchText;
    QVariantList m_layouts;
};

} // namespace pitchloop::desktop
