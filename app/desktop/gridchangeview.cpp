#include "gridchangeview.h"

#include "appclock.h"
#include "clubsession.h"
#include "display.h"
#include "gridchange.h"
#include "logging.h"
#include "repository.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>
#include <QMetaObject>

#include <algorithm>
#include <memory>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString qs(const std::string& s) { return QString::fromStdString(s); }

QString gridWords(const ZoneGrid& g) {
    return GridChangeView::tr("%1 (%2)").arg(qs(describeGrid(g)), qs(g.name()));
}

} // namespace

GridChangeView::GridChangeView(QObject* parent) : SessionClient(parent) {}

GridChangeView::~GridChangeView() { waitForWorker(); }

void GridChangeView::waitForWorker() {
    if (!m_thread) return;
    m_thread->wait();
    // The worker's last queued call has not run yet; run the ending now.
    QCoreApplication::sendPostedEvents(this);
}

ZoneGrid GridChangeView::chosen() const {
    return m_kind == 1 ? ZoneGrid::markings(m_bands) : ZoneGrid::equal(m_bands, m_lanes);
}

QString GridChangeView::chosenText() const { return gridWords(chosen()); }

void GridChangeView::setKind(int kind) {
    kind = std::clamp(kind, 0, 1);
    if (kind == m_kind) return;
    m_kind = kind;
    updatePreview();
}

void GridChangeView::setBands(int bands) {
    bands = std::clamp(bands, 1, maxCount());
    if (bands == m_bands) return;
    m_bands = bands;
    updatePreview();
}

void GridChangeView::setLanes(int lanes) {
    lanes = std::clamp(lanes, 1, maxCount());
    if (lanes == m_lanes) return;
    m_lanes = lanes;
    updatePreview();
}

void GridChangeView::setBy(const QString& by) {
    if (by == m_by) return;
    m_by = by;
    emit choiceChanged();
}

bool GridChangeView::canChange() const {
    ClubSession* s = session();
    return s && s->isOpen() && !running() && !(chosen() == m_current) &&
           !m_by.trimmed().isEmpty();
}

QString GridChangeView::progressText() const {
    if (!running()) return {};
    if (m_total == 0) return tr("Moving to %1…").arg(qs(m_target.name()));
    return tr("Counting match %1 of %2 again on %3…").arg(std::min(m_done + 1, m_total)).arg(m_total)
        .arg(qs(m_target.name()));
}

QString GridChangeView::undoText() const {
    if (m_undo.empty()) return {};
    return tr("Undo the grid change (back to %1)").arg(qs(m_undo.back().name()));
}

void GridChangeView::resetChoice() {
    m_kind = m_current.kind() == ZoneGrid::Kind::Markings ? 1 : 0;
    m_bands = m_current.bands();
    m_lanes = m_current.kind() == ZoneGrid::Kind::Markings ? m_lanes : m_current.lanes();
    updatePreview();
}

void GridChangeView::refresh() {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    const bool newFile = repo != m_repoSeen;
    if (newFile) {
        m_repoSeen = repo;
        if (!running()) m_undo.clear(); // an undo belongs to the club file it was made in
    }
    m_history.clear();
    if (!repo) {
        m_currentText.clear();
        m_previewLines.clear();
        emit storedChanged();
        emit choiceChanged();
        emit resultChanged();
        return;
    }
    m_current = repo->tallyGrid();
    m_currentText = gridWords(m_current);
    const auto changes = repo->gridChanges();
    for (auto it = changes.rbegin(); it != changes.rend(); ++it)
        m_history << tr("%1 · %2 → %3 by %4: %5")
                         .arg(compactDateText(it->at.substr(0, 10)), qs(it->from), qs(it->to),
                              qs(it->by), qs(it->summary));
    if (newFile) resetChoice();
    else updatePreview();
    emit storedChanged();
    emit resultChanged();
}

void GridChangeView::updatePreview() {
    m_previewLines.clear();
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (repo && !(chosen() == m_current) && !running()) {
        try {
            for (const auto& line : previewGridChange(*repo, chosen()).lines) m_previewLines << qs(line);
        } catch (const std::exception& e) {
            m_previewLines << tr("What the change would do could not be worked out: %1").arg(QString::fromUtf8(e.what()));
        }
    }
    emit choiceChanged();
}

bool GridChangeView::change() {
    if (chosen() == m_current) {
        setResult(tr("%1 is the grid in use already.").arg(qs(chosen().name())), {});
        return false;
    }
    if (m_by.trimmed().isEmpty()) {
        setResult(tr("Who changes the grid: type your name; it is kept with the change."), {});
        return false;
    }
    return start(chosen(), m_by.trimmed(), false);
}

bool GridChangeView::undo() {
    if (m_undo.empty()) return false;
    return start(m_undo.back(), m_undoBy, true);
}

bool GridChangeView::start(const ZoneGrid& to, const QString& by, bool isUndo) {
    ClubSession* s = session();
    ClubRepository* repo = s && s->isOpen() ? s->repository() : nullptr;
    if (!repo) {
        setResult(tr("No club file is open."), {});
        return false;
    }
    if (running()) return false;
    m_from = m_current;
    m_target = to;
    m_done = 0;
    m_total = 0;
    setResult({}, {});
    const std::string who = by.toStdString();
    const std::string now = nowUtcIso();
    m_undoBy = by;
    if (!QFileInfo(s->clubFile()).isFile()) {
        // A club file in memory (tests): no second connection can reach it, so on this thread.
        try {
            const int carried = repo->changeGrid(to, who, now);
            workerDone({}, carried, isUndo);
        } catch (const std::exception& e) {
            workerDone(QString::fromUtf8(e.what()), 0, isUndo);
        }
        return true;
    }
    // The worker opens its own connection: an SQLite connection must stay on one thread.
    const std::string file = QFile::encodeName(s->clubFile()).toStdString();
    m_thread = QThread::create([this, file, to, who, now, isUndo] {
        QString fault;
        int carried = 0;
        try {
            ClubRepository worker(file);
            carried = worker.changeGrid(to, who, now, [this](int done, int total) {
                QMetaObject::invokeMethod(this, [this, done, total] {
                    m_done = done;
                    m_total = total;
                    emit progressChanged();
                }, Qt::QueuedConnection);
            });
        } catch (const std::exception& e) {
            fault = QString::fromUtf8(e.what());
        }
        QMetaObject::invokeMethod(this, [this, fault, carried, isUndo] { workerDone(fault, carried, isUndo); },
                                  Qt::QueuedConnection);
    });
    m_thread->setObjectName(QStringLiteral("grid change"));
    m_thread->start();
    emit progressChanged();
    emit choiceChanged();
    emit resultChanged();
    return true;
}

void GridChangeView::workerDone(const QString& fault, int carried, bool isUndo) {
    if (m_thread) {
        m_thread->wait();
        delete m_thread;
        m_thread = nullptr;
    }
    if (!fault.isEmpty()) {
        qCWarning(lcDesktop).noquote() << "grid change failed:" << fault;
        setResult(tr("The grid was not changed: %1. The club file is as it was.").arg(fault), {});
    } else if (isUndo) {
        m_undo.pop_back();
        setResult({}, tr("Back on %1: the tallies are counted on it again and its targets are as they were.")
                          .arg(gridWords(m_target)));
    } else {
        m_undo.push_back(m_from);
        setResult({}, tr("Now on %1. Every match was counted again; %2. Check the targets page.")
                          .arg(gridWords(m_target),
                               carried == 1 ? tr("1 target version was carried over")
                                            : tr("%1 target versions were carried over").arg(carried)));
    }
    emit progressChanged();
    if (ClubSession* s = session(); s && fault.isEmpty()) s->reload(); // every page recomputes
    else update();
    if (isUndo && fault.isEmpty()) resetChoice(); // the choice shows the grid in use again
    emit finished();
}

void GridChangeView::setResult(const QString& problems, const QString& message) {
    m_problems = problems;
    m_message = message;
    emit resultChanged();
}

} // namespace pitchloop::desktop
