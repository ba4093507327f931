#include "clubsession.h"

#include "appclock.h"

#include "logging.h"
#include "matchlistmodel.h"
#include "metriclistmodel.h"

#include <QDir>
#include <QFileInfo>

#include <algorithm>

#include <exception>

namespace pitchloop::desktop {

using namespace pitchloop::model;

ClubSession::ClubSession(QObject* parent)
    : QObject(parent),
      m_matchModel(new MatchListModel(this)),
      m_metricModel(new MetricListModel(this)) {}

ClubSession::~ClubSession() = default;

bool ClubSession::open(const QString& file, bool demo) {
    try {
        const QFileInfo info(file);
        if (!info.absoluteDir().exists()) QDir().mkpath(info.absolutePath());
        return adopt(std::make_unique<ClubRepository>(QFile::encodeName(file).toStdString()), file,
                     demo);
    } catch (const std::exception& e) {
        setError(tr("Cannot open the club file %1: %2").arg(file, QString::fromUtf8(e.what())));
        return false;
    }
}

bool ClubSession::adopt(std::unique_ptr<ClubRepository> repo, const QString& label, bool demo) {
    m_repo = std::move(repo);
    m_file = label;
    m_demo = demo;
    m_seasons.clear();
    try {
        load();
    } catch (const std::exception& e) {
        m_repo.reset();
        m_matches.clear();
        m_metrics.clear();
        m_metricsById.clear();
        m_matchModel->reset({});
        m_metricModel->reset({});
        setError(tr("Cannot read the club file %1: %2").arg(label, QString::fromUtf8(e.what())));
        emit opened();
        return false;
    }
    emit opened();
    return true;
}

void ClubSession::load() {
    m_clubName = QString::fromStdString(m_repo->clubName());
    m_matches = m_repo->matches();
    m_metrics = m_repo->metrics();
    m_metricsById.clear();
    for (const auto& m : m_metrics) m_metricsById.emplace(m.id, m);
    m_grid = m_repo->tallyGrid();
    m_settings = m_repo->flagSettings();
    m_matchModel->reset(m_matches);
    m_metricModel->reset(m_metrics);
}

bool ClubSession::openFile(const QString& file) {
    try {
        auto repo = std::make_unique<ClubRepository>(QFile::encodeName(file).toStdString());
        return adopt(std::move(repo), file, false);
    } catch (const std::exception& e) {
        setError(tr("Cannot open the club file %1: %2").arg(file, QString::fromUtf8(e.what())));
        return false;
    }
}

void ClubSession::reload() {
    if (!m_repo) return;
    m_seasons.clear();
    try {
        load();
    } catch (const std::exception& e) {
        setError(tr("Cannot read the club file %1: %2").arg(m_file, QString::fromUtf8(e.what())));
    }
    emit opened();
}

QString ClubSession::latestMatchId() const {
    const MatchSummary* m = latestPlayed();
    return m ? QString::fromStdString(m->id) : QString();
}

const MatchSummary* ClubSession::latestPlayed() const {
    if (m_matches.empty()) return nullptr;
    const std::string today = todayIso();
    for (auto it = m_matches.rbegin(); it != m_matches.rend(); ++it)
        if (it->date <= today) return &*it;
    return &m_matches.back();
}

int ClubSession::matchesAfterToday() const {
    const std::string today = todayIso();
    return static_cast<int>(std::count_if(m_matches.begin(), m_matches.end(),
                                          [&](const MatchSummary& m) { return m.date > today; }));
}

const MatchSummary* ClubSession::summary(const std::string& matchId) const {
    for (const auto& m : m_matches)
        if (m.id == matchId) return &m;
    return nullptr;
}

const MetricSpec* ClubSession::metricSpec(const std::string& id) const {
    const auto it = m_metricsById.find(id);
    return it == m_metricsById.end() ? nullptr : &it->second;
}

std::shared_ptr<const SeasonData> ClubSession::seasonOf(const std::string& matchId) {
    const MatchSummary* m = summary(matchId);
    if (!m_repo || !m) return nullptr;
    const auto key = std::pair{m->squad, m->season};
    auto& slot = m_seasons[key];
    if (!slot)
        slot = std::make_shared<SeasonData>(m->squad, m->season,
                                            m_repo->seasonTallies(m->squad, m->season),
                                            m_repo->targets(m->squad, m->season), m_metrics, m_grid,
                                            m_settings);
    return slot;
}

void ClubSession::setError(const QString& message) {
    if (!message.isEmpty()) qCWarning(lcDesktop).noquote() << message;
    if (message == m_error) return;
    m_error = message;
    emit errorStringChanged();
}

} // namespace pitchloop::desktop
