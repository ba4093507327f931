#pragma once
// The focuses page: every focus with its state, one focus in full (frozen evidence, linked
// drills, training so far, the follow-up review with its control chart, the verdict), and the
// opening of a new focus from a flagged zone.

#include "sessionclient.h"
#include "zones.h"

#include <QString>
#include <QStringList>
#include <QVariantList>
#include <QUrl>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <cstdint>
#include <functional>
#include <optional>
#include <vector>

namespace pitchloop::model {
class ClubRepository;
struct Review;
} // namespace pitchloop::model

namespace pitchloop::desktop {

class ControlChartModel;
class DrillListModel;
class EvidenceListModel;
class FocusListModel;
class PitchGeometry;
class ZoneMapModel;

/// Outputs of the chosen focus (selectedId) and of the draft being opened (drafting).
/// "Today" is the app clock's (PITCHLOOP_TODAY replays a season) unless `today` is set.
class FocusView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("controlchartmodel.h")
    Q_MOC_INCLUDE("drilllistmodel.h")
    Q_MOC_INCLUDE("evidencelistmodel.h")
    Q_MOC_INCLUDE("focuslistmodel.h")
    Q_MOC_INCLUDE("pitchgeometry.h")
    Q_MOC_INCLUDE("zonemapmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString today READ today WRITE setToday NOTIFY listChanged)
    Q_PROPERTY(pitchloop::desktop::FocusListModel* focuses READ focuses CONSTANT)
    Q_PROPERTY(QString listText READ listText NOTIFY listChanged)
    Q_PROPERTY(bool hasMatches READ hasMatches NOTIFY listChanged)

    // The chosen focus
    Q_PROPERTY(int selectedId READ selectedIdForQml NOTIFY detailChanged)
    Q_PROPERTY(QString title READ title NOTIFY detailChanged)
    Q_PROPERTY(QString zonesText READ zonesText NOTIFY detailChanged)
    Q_PROPERTY(int phase READ phase NOTIFY detailChanged)
    Q_PROPERTY(QString phaseText READ phaseText NOTIFY detailChanged)
    Q_PROPERTY(QString openedText READ openedText NOTIFY detailChanged)
    Q_PROPERTY(QString reviewPointText READ reviewPointText NOTIFY detailChanged)
    Q_PROPERTY(QString noteText READ noteText NOTIFY detailChanged)
    Q_PROPERTY(QString minutesText READ minutesText NOTIFY detailChanged)
    Q_PROPERTY(QString verdictText READ verdictText NOTIFY detailChanged)
    Q_PROPERTY(bool closed READ closed NOTIFY detailChanged)
    Q_PROPERTY(QString evidenceTitle READ evidenceTitle NOTIFY detailChanged)
    Q_PROPERTY(pitchloop::desktop::EvidenceListModel* evidence READ evidence CONSTANT)
    /// Where the moments behind the evidence are: {metricId, band, lane, matchId} of the focus's
    /// first zone (0, 0 for the whole pitch) at the match that opened it; empty when the focus is
    /// on another grid than the club's.
    Q_PROPERTY(QVariantMap momentsAtOpening READ momentsAtOpening NOTIFY detailChanged)
    /// Whether the review computed now has matches before and after to list moments of.
    Q_PROPERTY(bool canExportReviewMoments READ canExportReviewMoments NOTIFY detailChanged)
    /// What the last moments export did ("Wrote 17 moments before and 11 after to …"), or why not.
    Q_PROPERTY(QString momentsMessage READ momentsMessage NOTIFY momentsExported)
    Q_PROPERTY(pitchloop::desktop::DrillListModel* linked READ linked CONSTANT)

    // Its review
    Q_PROPERTY(bool hasReview READ hasReview NOTIFY detailChanged)
    Q_PROPERTY(QString reviewProblem READ reviewProblem NOTIFY detailChanged)
    Q_PROPERTY(QString reviewSourceText READ reviewSourceText NOTIFY detailChanged)
    Q_PROPERTY(QString beforeValueText READ beforeValueText NOTIFY detailChanged)
    Q_PROPERTY(QString afterValueText READ afterValueText NOTIFY detailChanged)
    Q_PROPERTY(QString beforeText READ beforeText NOTIFY detailChanged)
    Q_PROPERTY(QString afterText READ afterText NOTIFY detailChanged)
    Q_PROPERTY(QString changeText READ changeText NOTIFY detailChanged)
    Q_PROPERTY(QString testText READ testText NOTIFY detailChanged)
    Q_PROPERTY(QString beliefText READ beliefText NOTIFY detailChanged)
    /// What the review's numbers cannot show, beside every review.
    Q_PROPERTY(QString caveatText READ caveatText NOTIFY detailChanged)
    Q_PROPERTY(QString trainingText READ trainingText NOTIFY detailChanged)
    Q_PROPERTY(QString chartTitle READ chartTitle NOTIFY detailChanged)
    /// How many matches before the start the chart's centre line and limits come from.
    Q_PROPERTY(int chartBaselineMatches READ chartBaselineMatches NOTIFY detailChanged)
    Q_PROPERTY(QString chartReadingText READ chartReadingText NOTIFY detailChanged)
    Q_PROPERTY(pitchloop::desktop::ControlChartModel* chart READ chart CONSTANT)
    Q_PROPERTY(QVariantList verdictOptions READ verdictOptions CONSTANT)
    Q_PROPERTY(int verdictChoice READ verdictChoice WRITE setVerdictChoice NOTIFY verdictFormChanged)
    Q_PROPERTY(QString verdictNote READ verdictNote WRITE setVerdictNote NOTIFY verdictFormChanged)
    Q_PROPERTY(QString verdictBy READ verdictBy WRITE setVerdictBy NOTIFY verdictFormChanged)
    Q_PROPERTY(QString verdictProblem READ verdictProblem NOTIFY verdictFormChanged)
    Q_PROPERTY(bool canRecordVerdict READ canRecordVerdict NOTIFY detailChanged)

    // Drills to link or pick
    Q_PROPERTY(QString drillQuery READ drillQuery WRITE setDrillQuery NOTIFY drillSearchChanged)
    Q_PROPERTY(QString drillSearchText READ drillSearchText NOTIFY drillSearchChanged)
    Q_PROPERTY(pitchloop::desktop::DrillListModel* drillResults READ drillResults CONSTANT)

    // Opening a focus
    Q_PROPERTY(bool drafting READ drafting NOTIFY draftChanged)
    Q_PROPERTY(QString draftMatchId READ draftMatchId NOTIFY draftChanged)
    Q_PROPERTY(int draftMatchRow READ draftMatchRow NOTIFY draftChanged)
    Q_PROPERTY(QString draftMetricId READ draftMetricId NOTIFY draftChanged)
    Q_PROPERTY(int draftMetricRow READ draftMetricRow NOTIFY draftChanged)
    Q_PROPERTY(QString draftMetricName READ draftMetricName NOTIFY draftChanged)
    Q_PROPERTY(bool draftWholePitch READ draftWholePitch NOTIFY draftChanged)
    Q_PROPERTY(QVariantList draftZones READ draftZones NOTIFY draftChanged)
    Q_PROPERTY(QString draftZonesText READ draftZonesText NOTIFY draftChanged)
    Q_PROPERTY(QString draftStartText READ draftStartText NOTIFY draftChanged)
    Q_PROPERTY(QString draftSlipText READ draftSlipText NOTIFY draftChanged)
    Q_PROPERTY(bool draftSlipped READ draftSlipped NOTIFY draftChanged)
    Q_PROPERTY(pitchloop::desktop::EvidenceListModel* draftEvidence READ draftEvidence CONSTANT)
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* draftMap READ draftMap CONSTANT)
    Q_PROPERTY(pitchloop::desktop::DrillListModel* draftDrills READ draftDrills CONSTANT)
    Q_PROPERTY(QString draftNote READ draftNote WRITE setDraftNote NOTIFY draftFormChanged)
    /// The smallest improvement that would matter, as typed: points for rates ("8"), the
    /// metric's unit for counts; empty for the target's margin.
    Q_PROPERTY(QString draftMinChange READ draftMinChange WRITE setDraftMinChange NOTIFY draftFormChanged)
    Q_PROPERTY(int draftReviewAfter READ draftReviewAfter WRITE setDraftReviewAfter NOTIFY draftFormChanged)
    Q_PROPERTY(QString draftReviewOn READ draftReviewOn WRITE setDraftReviewOn NOTIFY draftFormChanged)
    Q_PROPERTY(QString draftBy READ draftBy WRITE setDraftBy NOTIFY draftFormChanged)
    Q_PROPERTY(QStringList draftProblems READ draftProblems NOTIFY draftFormChanged)
    Q_PROPERTY(pitchloop::desktop::PitchGeometry* geometry READ geometry CONSTANT)
    Q_PROPERTY(QString statusText READ statusText NOTIFY statusChanged)
public:
    explicit FocusView(QObject* parent = nullptr);
    ~FocusView() override;

    QString today() const;
    void setToday(const QString& isoDate);
    FocusListModel* focuses() const { return m_focuses; }
    QString listText() const { return m_listText; }
    bool hasMatches() const;

    qint64 selectedId() const { return m_selectedId; }
    /// The id for QML, whose whole numbers are 32-bit (drill and focus ids stay far below).
    int selectedIdForQml() const { return static_cast<int>(m_selectedId); }
    QString title() const { return m_title; }
    QString zonesText() const { return m_zonesText; }
    int phase() const { return m_phase; }
    QString phaseText() const { return m_phaseText; }
    QString openedText() const { return m_openedText; }
    QString reviewPointText() const { return m_reviewPointText; }
    QString noteText() const { return m_noteText; }
    QString minutesText() const { return m_minutesText; }
    QString verdictText() const { return m_verdictText; }
    bool closed() const { return m_closed; }
    bool canExportReviewMoments() const { return !m_reviewBeforeIds.empty() && !m_reviewAfterIds.empty(); }
    QString momentsMessage() const { return m_momentsMessage; }
    QVariantMap momentsAtOpening() const { return m_momentsAtOpening; }
    QString evidenceTitle() const { return m_evidenceTitle; }
    EvidenceListModel* evidence() const { return m_evidence; }
    DrillListModel* linked() const { return m_linked; }

    bool hasReview() const { return m_hasReview; }
    QString reviewProblem() const { return m_reviewProblem; }
    QString reviewSourceText() const { return m_reviewSourceText; }
    QString beforeValueText() const { return m_beforeValueText; }
    QString afterValueText() const { return m_afterValueText; }
    QString beforeText() const { return m_beforeText; }
    QString afterText() const { return m_afterText; }
    QString changeText() const { return m_changeText; }
    QString testText() const { return m_testText; }
    QString beliefText() const { return m_beliefText; }
    QString caveatText() const { return m_caveatText; }
    QString trainingText() const { return m_trainingText; }
    QString chartTitle() const { return m_chartTitle; }
    int chartBaselineMatches() const { return m_chartBaselineMatches; }
    QString chartReadingText() const { return m_chartReadingText; }
    ControlChartModel* chart() const { return m_chart; }
    QVariantList verdictOptions() const;
    int verdictChoice() const { return m_verdictChoice; }
    void setVerdictChoice(int v);
    QString verdictNote() const { return m_verdictNote; }
    void setVerdictNote(const QString& v);
    QString verdictBy() const { return m_verdictBy; }
    void setVerdictBy(const QString& v);
    QString verdictProblem() const { return m_verdictProblem; }
    bool canRecordVerdict() const { return !m_closed && m_hasReview && m_selectedId != 0; }

    QString drillQuery() const { return m_drillQuery; }
    void setDrillQuery(const QString& v);
    QString drillSearchText() const { return m_drillSearchText; }
    DrillListModel* drillResults() const { return m_drillResults; }

    bool drafting() const { return m_drafting; }
    QString draftMatchId() const { return m_draftMatchId; }
    int draftMatchRow() const;
    QString draftMetricId() const { return m_draftMetricId; }
    int draftMetricRow() const;
    QString draftMetricName() const { return m_draftMetricName; }
    bool draftWholePitch() const { return m_draftWhole; }
    QVariantList draftZones() const;
    QString draftZonesText() const { return m_draftZonesText; }
    QString draftStartText() const { return m_draftStartText; }
    QString draftSlipText() const { return m_draftSlipText; }
    bool draftSlipped() const { return m_draftSlipped; }
    EvidenceListModel* draftEvidence() const { return m_draftEvidence; }
    ZoneMapModel* draftMap() const { return m_draftMap; }
    DrillListModel* draftDrills() const { return m_draftDrillModel; }
    QString draftNote() const { return m_draftNote; }
    QString draftMinChange() const { return m_draftMinChange; }
    void setDraftMinChange(const QString& v) {
        if (v == m_draftMinChange) return;
        m_draftMinChange = v;
        emit draftFormChanged();
    }
    void setDraftNote(const QString& v);
    int draftReviewAfter() const { return m_draftReviewAfter; }
    void setDraftReviewAfter(int v);
    QString draftReviewOn() const { return m_draftReviewOn; }
    void setDraftReviewOn(const QString& v);
    QString draftBy() const { return m_draftBy; }
    void setDraftBy(const QString& v);
    QStringList draftProblems() const { return m_draftProblems; }
    PitchGeometry* geometry() const { return m_geometry; }
    QString statusText() const { return m_statusText; }

    Q_INVOKABLE bool select(qint64 focusId);
    Q_INVOKABLE bool linkDrill(qint64 drillId);
    Q_INVOKABLE bool unlinkDrill(qint64 drillId);
    /// Closes the chosen focus with the verdict form's choice, note and name, storing the
    /// review's numbers with it (FocusStore::close with reviewToJson).
    Q_INVOKABLE bool recordVerdict();
    /// Writes the moments behind the review's baseline and its matches after the start, side by
    /// side, as CSV (model/moments.h reviewMomentsCsv; the command line's review --moments).
    Q_INVOKABLE bool exportReviewMoments(const QUrl& file);

    /// Starts opening a focus on one flagged zone (band 0, lane 0: the whole pitch) after a match.
    Q_INVOKABLE void openFromZone(const QString& metricId, int band, int lane, const QString& matchId);
    /// Starts opening a focus on the latest match's most certain slip (else its first metric).
    Q_INVOKABLE void beginDraft();
    Q_INVOKABLE void setDraftMatch(const QString& matchId);
    Q_INVOKABLE void setDraftMetric(const QString& metricId);
    Q_INVOKABLE void toggleDraftZone(int band, int lane);
    Q_INVOKABLE void setDraftWholePitch(bool whole);
    Q_INVOKABLE void pickDraftDrill(qint64 drillId);
    Q_INVOKABLE void dropDraftDrill(qint64 drillId);
    Q_INVOKABLE void cancelDraft();
    /// Opens the draft as a focus, freezing its evidence now. On a problem nothing is written and
    /// the draft keeps everything typed.
    Q_INVOKABLE bool confirmDraft();

signals:
    void momentsExported();
    void listChanged();
    void detailChanged();
    void verdictFormChanged();
    void drillSearchChanged();
    void draftChanged();
    void draftFormChanged();
    void statusChanged();

protected:
    void refresh() override;

private:
    model::ClubRepository* repository() const;
    bool guard(const QString& what, const std::function<bool()>& action);
    void refreshList();
    void refreshDetail();
    void clearDetail();
    void showReview(const model::Review& review, bool stored);
    void refreshDrillSearch();
    void refreshDraft();
    void setStatus(const QString& text);
    QString metricName(const std::string& id) const;
    std::vector<std::int64_t> excludedDrills() const;

    QString m_today;
    model::ClubRepository* m_repo = nullptr;
    FocusListModel* m_focuses;
    QString m_listText;

    qint64 m_selectedId = 0;
    QString m_title, m_zonesText;
    int m_phase = 0;
    QString m_phaseText, m_openedText, m_reviewPointText, m_noteText, m_minutesText, m_verdictText;
    bool m_closed = false;
    std::vector<std::string> m_reviewBeforeIds; ///< the review computed now: its baseline's matches
    std::vector<std::string> m_reviewAfterIds;
    QString m_momentsMessage;
    QVariantMap m_momentsAtOpening;
    QString m_evidenceTitle;
    EvidenceListModel* m_evidence;
    DrillListModel* m_linked;
    std::vector<std::int64_t> m_linkedIds;
    std::string m_focusMetric;

    bool m_hasReview = false;
    QString m_reviewProblem, m_reviewSourceText, m_beforeValueText, m_afterValueText, m_beforeText,
        m_afterText, m_changeText, m_testText, m_beliefText, m_caveatText, m_trainingText, m_chartTitle,
        m_chartReadingText;
    int m_chartBaselineMatches = 0;
    std::string m_reviewJson; ///< the computed review, stored with a verdict
    ControlChartModel* m_chart;
    int m_verdictChoice = -1;
    QString m_verdictNote, m_verdictBy, m_verdictProblem;

    QString m_drillQuery, m_drillSearchText;
    DrillListModel* m_drillResults;

    bool m_drafting = false;
    QString m_draftMatchId, m_draftMetricId, m_draftMetricName;
    bool m_draftWhole = false;
    std::vector<model::Zone> m_draftZones;
    QString m_draftZonesText, m_draftStartText, m_draftSlipText;
    bool m_draftSlipped = false;
    std::vector<std::int64_t> m_draftDrills;
    EvidenceListModel* m_draftEvidence;
    ZoneMapModel* m_draftMap;
    DrillListModel* m_draftDrillModel;
    QString m_draftNote;
    QString m_draftMinChange;
    int m_draftReviewAfter = 5;
    QString m_draftReviewOn, m_draftBy;
    QStringList m_draftProblems;
    PitchGeometry* m_geometry;
    QString m_statusText;
};

} // namespace pitchloop::desktop
