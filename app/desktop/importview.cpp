#include "importview.h"

#include "appclock.h"
#include "profilestore.h"

#include "clubsession.h"
#include "display.h"
#include "importresultmodel.h"
#include "ingest.h"
#include "logging.h"
#include "repository.h"

#include <QDir>
#include <QDirIterator>
#include <QFile>
#include <QFileInfo>
#include <QLocale>

#include <algorithm>
#include <exception>
#include <filesystem>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// Loads one file through the worker's own connection and words the outcome. Runs on the
/// worker thread; touches nothing shared.
ImportResult ingestOne(ClubRepository& repo, const QString& path, const MatchDetails& details,
                       const IngestOptions& options) {
    ImportResult r;
    r.path = path;
    r.fileName = QFileInfo(path).fileName();
    const std::filesystem::path file(QFile::encodeName(path).toStdString());
    std::vector<IngestReport> reports;
    QString layout;
    try {
        if (looksLikeTable(r.fileName.toStdString())) {
            // A table loads with the saved profile whose columns it has (docs/import.md).
            std::string bytes;
            try {
                bytes = readFileBytes(file);
            } catch (const IoError&) {
            }
            const auto saved = profileFor(bytes, ProfileStore(repo).list());
            if (!saved) {
                r.outcome = ImportResult::Failed;
                r.detail = QStringLiteral("Nothing of this file was stored.");
                r.problems << QStringLiteral("%1: no saved layout reads this table. Drop it alone "
                                             "to map its columns in the mapping assistant, or save "
                                             "a layout file with “Save a table layout…”.")
                                  .arg(r.fileName);
                return r;
            }
            layout = QString::fromStdString(saved->name);
            reports = ingestTableFile(repo, file, *parseProfile(saved->text, saved->name).profile, details, options);
        } else {
            reports.push_back(ingestFile(repo, file, options));
        }
    } catch (const std::exception& e) {
        r.outcome = ImportResult::Failed;
        r.detail = QStringLiteral("Nothing of this file was stored.");
        r.problems << QStringLiteral("%1: the club file could not be written: %2")
                          .arg(r.fileName, QString::fromUtf8(e.what()));
        return r;
    }
    // The row names the file already: problems name it by its short name, not its full path.
    const std::string shortName = r.fileName.toStdString();
    const auto describe = [&](Problem p) {
        p.file = shortName;
        return QString::fromStdString(p.describe());
    };
    bool anyFailed = false, anyRefused = false, allUnchanged = true, anyReplaced = false;
    int events = 0;
    QStringList stored;
    for (const IngestReport& report : reports) {
        for (const auto& p : report.errors) r.problems << describe(p);
        for (const auto& p : report.warnings) r.warnings << describe(p);
        const bool failed = report.status == IngestStatus::Invalid || report.status == IngestStatus::Refused;
        anyFailed |= failed;
        anyRefused |= report.status == IngestStatus::Refused;
        allUnchanged &= report.status == IngestStatus::Unchanged;
        anyReplaced |= report.status == IngestStatus::Replaced;
        if (!failed) {
            r.matchId = QString::fromStdString(report.matchId);
            stored << r.matchId;
            events += report.events;
        }
    }
    r.outcome = anyFailed ? ImportResult::Failed
                : allUnchanged ? ImportResult::Unchanged
                : anyReplaced ? ImportResult::Replaced
                              : ImportResult::Stored;
    if (anyFailed) {
        r.detail = anyRefused
                       ? QStringLiteral("Nothing of this file was stored. To store it in place of the "
                                        "stored match, tick “Replace changed matches” and load it again.")
                       : QStringLiteral("Nothing of this file was stored.");
        if (reports.size() > 1 && !stored.isEmpty())
            r.detail = QStringLiteral("Stored %1; the other matches of this table were not (each is its own transaction).")
                           .arg(stored.join(QStringLiteral(", ")));
        return r;
    }
    if (reports.size() == 1) {
        if (const auto summary = repo.matchSummary(reports.front().matchId)) {
            r.matchDate = QString::fromStdString(summary->date);
            r.detail = QStringLiteral("%1 · %2 v %3 · %4 events")
                           .arg(r.matchId, dateText(summary->date),
                                QString::fromStdString(summary->opponent), QLocale().toString(events));
        }
    } else {
        r.detail = QStringLiteral("%1 matches (%2) · %3 events")
                       .arg(reports.size())
                       .arg(stored.join(QStringLiteral(", ")), QLocale().toString(events));
        if (const auto summary = repo.matchSummary(reports.back().matchId))
            r.matchDate = QString::fromStdString(summary->date);
    }
    if (!layout.isEmpty()) r.detail += QStringLiteral(" · read with the saved layout “%1”").arg(layout);
    if (r.outcome == ImportResult::Unchanged)
        r.detail += QStringLiteral(" · this very file is already in the club file");
    return r;
}

QString plural(int n, const QString& one, const QString& many) {
    return n == 1 ? QStringLiteral("1 %1").arg(one) : QStringLiteral("%1 %2").arg(n).arg(many);
}

} // namespace

ImportView::ImportView(QObject* parent) : SessionClient(parent), m_results(new ImportResultModel(this)) {}

ImportView::~ImportView() {
    if (!m_thread) return;
    m_cancel->store(true);
    m_thread->wait();
    delete m_thread;
}

QString ImportView::progressText() const {
    if (!m_running) return {};
    if (cancelling()) return tr("Cancelling after %1 …").arg(m_currentFile);
    return tr("%1 of %2 files · %3").arg(m_done).arg(total()).arg(m_currentFile);
}

void ImportView::setReplace(bool replace) {
    if (replace == m_replace) return;
    m_replace = replace;
    emit replaceChanged();
}

bool ImportView::hasFailures() const { return m_results->countOf(ImportResult::Failed) > 0; }

void ImportView::refresh() {
    const ClubSession* s = session();
    const QString file = s && s->isOpen() ? s->clubFile() : QString();
    const bool can = !file.isEmpty() && file != QStringLiteral(":memory:");
    readLayouts();
    if (can == m_canLoad && file == m_clubFile) return;
    m_canLoad = can;
    m_clubFile = file;
    emit canLoadChanged();
}

void ImportView::readLayouts() {
    QVariantList layouts;
    ClubSession* s = session();
    if (ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr) {
        for (const SavedProfile& saved : ProfileStore(*repo).list()) {
            QStringList columns;
            if (const ProfileResult p = parseProfile(saved.text, saved.name); p.profile)
                for (const auto& [field, column] : p.profile->columns) columns << QString::fromStdString(column);
            layouts << QVariantMap{{QStringLiteral("name"), QString::fromStdString(saved.name)},
                                   {QStringLiteral("savedAt"), QString::fromStdString(saved.savedAt.substr(0, 10))},
                                   {QStringLiteral("columnsText"), columns.join(QStringLiteral(", "))}};
        }
    }
    if (layouts == m_layouts) return;
    m_layouts = layouts;
    emit layoutsChanged();
}

bool ImportView::removeLayout(const QString& name) {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) return false;
    bool removed = false;
    try {
        removed = ProfileStore(*repo).remove(name.toStdString());
    } catch (const std::exception& e) {
        setSummary(tr("The layout was not removed: %1").arg(QString::fromUtf8(e.what())));
        return false;
    }
    if (removed) setSummary(tr("Removed the layout “%1”. Matches loaded with it stay as they are.").arg(name));
    readLayouts();
    return removed;
}

QString ImportView::duplicateLayout(const QString& name) {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) return {};
    try {
        ProfileStore store(*repo);
        const auto saved = store.get(name.toStdString());
        if (!saved) return {};
        QString copy = tr("%1 (copy)").arg(name);
        for (int n = 2; store.get(copy.toStdString()); ++n) copy = tr("%1 (copy %2)").arg(name).arg(n);
        // The copy's own name goes into its text too, so that it reads as itself.
        auto doc = nlohmann::json::parse(saved->text);
        doc["name"] = copy.toStdString();
        if (!store.save(copy.toStdString(), doc.dump(2), {}, nowUtcIso()).empty()) return {};
        setSummary(tr("Saved a copy of “%1” as “%2”.").arg(name, copy));
        readLayouts();
        return copy;
    } catch (const std::exception& e) {
        setSummary(tr("The layout was not copied: %1").arg(QString::fromUtf8(e.what())));
        return {};
    }
}

void ImportView::setSummary(const QString& text) {
    m_summary = text;
    emit summaryChanged();
}

QStringList ImportView::expandPaths(const QStringList& paths) {
    QStringList out;
    for (const QString& path : paths) {
        const QFileInfo info(path);
        if (!info.isDir()) {
            out << path;
            continue;
        }
        QStringList inside;
        QDirIterator it(path, {QStringLiteral("*.json"), QStringLiteral("*.csv"), QStringLiteral("*.tsv"),
                               QStringLiteral("*.jsonl"), QStringLiteral("*.ndjson")},
                        QDir::Files | QDir::Readable,
                        QDirIterator::Subdirectories);
        while (it.hasNext()) inside << it.next();
        std::sort(inside.begin(), inside.end());
        out << inside;
    }
    return out;
}

bool ImportView::loadUrls(const QList<QUrl>& urls) {
    QStringList paths;
    QStringList notLocal;
    for (const QUrl& url : urls) {
        if (url.isLocalFile()) paths << url.toLocalFile();
        else notLocal << url.toString();
    }
    if (paths.isEmpty() && !notLocal.isEmpty()) {
        setSummary(tr("Only files on this computer can be loaded, not %1.").arg(notLocal.join(QStringLiteral(", "))));
        return false;
    }
    return loadPaths(paths);
}

bool ImportView::loadPaths(const QStringList& given) { return start(given, {}); }

bool ImportView::loadWithDetails(const QStringList& paths, const QVariantMap& details) {
    return start(paths, details);
}

bool ImportView::start(const QStringList& given, const QVariantMap& details_in) {
    if (m_running) {
        setSummary(tr("Still loading the previous files: wait for them, or cancel, then try again."));
        return false;
    }
    ClubSession* s = session();
    if (!s || !s->isOpen()) {
        setSummary(tr("No club file is open, so there is nowhere to store matches."));
        return false;
    }
    if (!m_canLoad) {
        setSummary(tr("This club file is not a file on disk, so matches cannot be loaded into it."));
        return false;
    }
    QStringList paths = expandPaths(given);
    // A table no saved layout reads goes to the mapping assistant instead (the first one; any
    // other is refused with what to do).
    if (details_in.isEmpty()) {
        const auto saved = ProfileStore(*s->repository()).list();
        for (const QString& path : paths) {
            if (!looksLikeTable(QFileInfo(path).fileName().toStdString())) continue;
            std::string bytes;
            try {
                bytes = readFileBytes(QFile::encodeName(path).toStdString());
            } catch (const IoError&) {
                continue;
            }
            if (profileFor(bytes, saved)) continue;
            paths.removeOne(path);
            emit layoutNeeded(path);
            if (paths.isEmpty()) {
                setSummary(tr("%1 is a table in a layout not saved yet: map its columns below, once.")
                               .arg(QFileInfo(path).fileName()));
                return false;
            }
            break;
        }
    }
    if (paths.isEmpty()) {
        setSummary(tr("No match files there: a match file is a .json file (see docs/match.schema.json), a table a .csv, .tsv or .jsonl file."));
        return false;
    }

    m_results->clear();
    m_paths = paths;
    m_done = 0;
    m_currentFile = QFileInfo(paths.front()).fileName();
    m_latestMatchId.clear();
    m_latestMatchText.clear();
    m_summary.clear();
    emit summaryChanged();
    m_cancel = std::make_shared<std::atomic<bool>>(false);
    m_running = true;
    emit runningChanged();
    emit progressChanged();

    IngestOptions options;
    options.replace = m_replace;
    MatchDetails details;
    for (auto it = details_in.begin(); it != details_in.end(); ++it)
        if (!it.value().toString().isEmpty()) details.values[it.key().toStdString()] = it.value().toString().toStdString();
    // The worker opens its own connection: an SQLite connection must stay on one thread.
    const std::string file = QFile::encodeName(s->clubFile()).toStdString();
    m_thread = QThread::create([this, cancel = m_cancel, file, paths, details, options] {
        QString fault;
        std::unique_ptr<ClubRepository> repo;
        try {
            repo = std::make_unique<ClubRepository>(file);
        } catch (const std::exception& e) {
            fault = QString::fromUtf8(e.what());
        }
        for (int i = 0; repo && i < paths.size() && !cancel->load(); ++i) {
            const QString name = QFileInfo(paths[i]).fileName();
            QMetaObject::invokeMethod(this, [this, i, name] { fileStarted(i, name); }, Qt::QueuedConnection);
            const ImportResult result = ingestOne(*repo, paths[i], details, options);
            QMetaObject::invokeMethod(this, [this, result] { fileDone(result); }, Qt::QueuedConnection);
        }
        QMetaObject::invokeMethod(this, [this, fault] { workerDone(fault); }, Qt::QueuedConnection);
    });
    m_thread->setObjectName(QStringLiteral("match import"));
    m_thread->start();
    return true;
}

bool ImportView::saveLayout(const QUrl& profileFile) {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) {
        setSummary(tr("No club file is open, so there is nowhere to save the layout."));
        return false;
    }
    const QString path = localPath(profileFile);
    const QString shortName = QFileInfo(path).fileName();
    std::string text;
    try {
        text = readFileBytes(QFile::encodeName(path).toStdString());
    } catch (const std::exception&) {
        setSummary(tr("%1 cannot be read.").arg(shortName));
        return false;
    }
    const ProfileResult parsed = parseProfile(text, shortName.toStdString());
    if (!parsed.profile) {
        QStringList lines;
        for (const auto& p : parsed.errors) lines << QString::fromStdString(p.describe());
        setSummary(tr("The layout was not saved:\n%1").arg(lines.join(QLatin1Char('\n'))));
        return false;
    }
    const std::string name = parsed.profile->name.empty() ? QFileInfo(path).completeBaseName().toStdString()
                                                          : parsed.profile->name;
    try {
        ProfileStore(*repo).save(name, text, {}, nowUtcIso());
    } catch (const std::exception& e) {
        setSummary(tr("The layout was not saved: %1").arg(QString::fromUtf8(e.what())));
        return false;
    }
    setSummary(tr("Saved the table layout “%1”: tables with its columns now load when dropped here.")
                   .arg(QString::fromStdString(name)));
    readLayouts();
    return true;
}

void ImportView::cancel() {
    if (!m_running || !m_cancel || m_cancel->load()) return;
    m_cancel->store(true);
    emit progressChanged();
}

void ImportView::fileStarted(int index, const QString& name) {
    Q_UNUSED(index);
    m_currentFile = name;
    emit progressChanged();
}

void ImportView::fileDone(ImportResult result) {
    if (!result.problems.isEmpty())
        qCInfo(lcDesktop).noquote() << "not loaded:" << result.problems.join(QStringLiteral("; "));
    m_results->append(std::move(result));
    ++m_done;
    emit progressChanged();
}

void ImportView::workerDone(const QString& fault) {
    m_thread->wait();
    delete m_thread;
    m_thread = nullptr;
    const bool cancelled = m_cancel->load();
    for (int i = m_results->count(); i < m_paths.size(); ++i) {
        ImportResult r;
        r.path = m_paths[i];
        r.fileName = QFileInfo(r.path).fileName();
        r.outcome = ImportResult::NotLoaded;
        r.detail = fault.isEmpty() ? tr("Not loaded: the load was cancelled before this file.")
                                   : tr("Not loaded: the club file could not be opened.");
        m_results->append(std::move(r));
    }

    // The newest match this load stored, for "open its debrief".
    const ImportResult* latest = nullptr;
    for (const ImportResult& r : m_results->rows()) {
        if (r.outcome != ImportResult::Stored && r.outcome != ImportResult::Replaced) continue;
        if (!latest || r.matchDate > latest->matchDate) latest = &r;
    }
    if (latest) {
        m_latestMatchId = latest->matchId;
        m_latestMatchText = latest->detail;
    }

    const int stored = m_results->countOf(ImportResult::Stored);
    const int replaced = m_results->countOf(ImportResult::Replaced);
    const int unchanged = m_results->countOf(ImportResult::Unchanged);
    const int failed = m_results->countOf(ImportResult::Failed);
    const int notLoaded = m_results->countOf(ImportResult::NotLoaded);
    QStringList parts;
    if (stored > 0) parts << tr("%1 stored").arg(stored);
    if (replaced > 0) parts << tr("%1 replaced").arg(replaced);
    if (unchanged > 0) parts << tr("%1 unchanged").arg(unchanged);
    if (failed > 0) parts << tr("%1 failed").arg(failed);
    if (notLoaded > 0) parts << tr("%1 not loaded").arg(notLoaded);
    QString summary;
    if (!fault.isEmpty())
        summary = tr("Could not open the club file to load into it: %1").arg(fault);
    else if (cancelled)
        summary = tr("Cancelled after %1 of %2: %3.")
                      .arg(m_done)
                      .arg(plural(total(), tr("file"), tr("files")), parts.join(QStringLiteral(", ")));
    else
        summary = tr("Loaded %1: %2.").arg(plural(total(), tr("file"), tr("files")), parts.join(QStringLiteral(", ")));
    if (failed > 0)
        summary += QStringLiteral(" ") + (failed == 1 ? tr("Nothing of the failed file was stored; its problems are listed below.")
                                                   : tr("Nothing of the failed files was stored; their problems are listed below."));

    m_running = false;
    m_currentFile.clear();
    m_summary = summary;
    if ((stored > 0 || replaced > 0) && session()) session()->reload();
    emit progressChanged();
    emit runningChanged();
    emit summaryChanged();
    emit finished();
}

} // namespace pitchloop::desktop
