#pragma once
// The open club file and what every page shares: matches, metrics, flag settings, the zone
// grid and the seasons loaded so far. The catch boundary for opening and reading the file.

#include "repository.h"
#include "seasondata.h"

#include <QObject>
#include <QString>
#include <QtQml/qqmlregistration.h>

#include <map>
#include <memory>
#include <string>
#include <utility>
#include <vector>

namespace pitchloop::desktop {

class MatchListModel;
class MetricListModel;

/// The club file the app works on, opened once by the composition root (main.cpp).
class ClubSession : public QObject {
    Q_OBJECT
    Q_MOC_INCLUDE("matchlistmodel.h")
    Q_MOC_INCLUDE("metriclistmodel.h")
    QML_ELEMENT
    QML_UNCREATABLE("The application opens the club file")
    Q_PROPERTY(bool isOpen READ isOpen NOTIFY opened)
    Q_PROPERTY(QString clubName READ clubName NOTIFY opened)
    Q_PROPERTY(QString clubFile READ clubFile NOTIFY opened)
    /// True when the app fell back to the demo club because the user has no club file yet.
    Q_PROPERTY(bool demo READ isDemo NOTIFY opened)
    Q_PROPERTY(int matchCount READ matchCount NOTIFY opened)
    Q_PROPERTY(QString latestMatchId READ latestMatchId NOTIFY opened)
    Q_PROPERTY(int matchesAfterToday READ matchesAfterToday NOTIFY opened)
    Q_PROPERTY(QString errorString READ errorString NOTIFY errorStringChanged)
    Q_PROPERTY(pitchloop::desktop::MatchListModel* matches READ matches CONSTANT)
    Q_PROPERTY(pitchloop::desktop::MetricListModel* metrics READ metrics CONSTANT)
public:
    explicit ClubSession(QObject* parent = nullptr);
    ~ClubSession() override;

    /// Opens (creating when missing) the club file. On a storage fault returns false and sets
    /// errorString; the session then stays closed.
    bool open(const QString& file, bool demo = false);
    /// Takes an already open repository (tests use ":memory:" files).
    bool adopt(std::unique_ptr<model::ClubRepository> repo, const QString& label, bool demo = false);

    bool isOpen() const { return m_repo != nullptr; }
    QString clubName() const { return m_clubName; }
    QString clubFile() const { return m_file; }
    bool isDemo() const { return m_demo; }
    int matchCount() const { return static_cast<int>(m_matches.size()); }
    /// The id of latestPlayed().
    QString latestMatchId() const;
    /// The latest stored match dated on or before today: a match dated later (invented demo
    /// data, or a date typed wrong) is not "the last match". The latest of all when every match
    /// is later; nullptr without matches.
    const model::MatchSummary* latestPlayed() const;
    /// Stored matches dated after today.
    int matchesAfterToday() const;
    QString errorString() const { return m_error; }
    MatchListModel* matches() const { return m_matchModel; }
    MetricListModel* metrics() const { return m_metricModel; }

    // For the page controllers -----------------------------------------------------------
    /// Stored matches, oldest first.
    const std::vector<model::MatchSummary>& matchSummaries() const { return m_matches; }
    const model::MatchSummary* summary(const std::string& matchId) const;
    const std::vector<model::MetricSpec>& metricSpecs() const { return m_metrics; }
    const model::MetricSpec* metricSpec(const std::string& id) const;
    const std::map<std::string, model::MetricSpec>& metricsById() const { return m_metricsById; }
    const model::ZoneGrid& grid() const { return m_grid; }
    const model::FlagSettings& flagSettings() const { return m_settings; }
    /// The season holding a match, loaded on first use and kept; nullptr for an unknown match.
    /// Throws StorageError on a storage fault.
    std::shared_ptr<const SeasonData> seasonOf(const std::string& matchId);
    /// Logs a caught fault and shows it to QML.
    void setError(const QString& message);
    /// The open club file for controllers that read or write beyond what the session caches
    /// (drill book, focuses, targets, fixtures, sessions); nullptr while closed.
    model::ClubRepository* repository() const { return m_repo.get(); }

    /// Opens another club file (the user's choice); on failure the current one stays open.
    Q_INVOKABLE bool openFile(const QString& file);
    /// Re-reads matches, metrics, targets and settings after an edit or import and tells every
    /// page (the `opened` signal), so all screens show the same club file state.
    Q_INVOKABLE void reload();

signals:
    /// The club file was opened or its content changed (reload); pages recompute.
    void opened();
    void errorStringChanged();

private:
    void load();

    std::unique_ptr<model::ClubRepository> m_repo;
    QString m_file;
    QString m_clubName;
    bool m_demo = false;
    QString m_error;
    std::vector<model::MatchSummary> m_matches;
    std::vector<model::MetricSpec> m_metrics;
    std::map<std::string, model::MetricSpec> m_metricsById;
    model::ZoneGrid m_grid;
    model::FlagSettings m_settings;
    std::map<std::pair<std::string, std::string>, std::shared_ptr<SeasonData>> m_seasons;
    MatchListModel* m_matchModel;
    MetricListModel* m_metricModel;
};

} // namespace pitchloop::desktop
