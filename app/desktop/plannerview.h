#pragma once
// The week planner page: the week around a chosen date with each day's microcycle label,
// intensity cap, fixture and saved session; for a chosen day, a session proposed by the model's
// planner (run off the window's thread), adjusted by the coach (pin, leave out, swap), saved,
// and exported as a session sheet (PDF) or the week as a calendar file (.ics).

#include "planner.h"
#include "sessionclient.h"

#include <QFutureWatcher>
#include <QString>
#include <QVariantMap>
#include <QUrl>
#include <QtQml/qqmlregistration.h>

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {
class ClubRepository;
}

namespace pitchloop::desktop {

class PlanBlockModel;
class PlanDrillChoiceModel;
class PlanFocusModel;
class PlanWeekModel;

/// Inputs: `date` (any day of the week to show; empty: today, or $PITCHLOOP_TODAY) and the
/// chosen day (selectDay). Outputs: the week, the chosen day, and the proposed session.
class PlannerView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("planblockmodel.h")
    Q_MOC_INCLUDE("plandrillchoicemodel.h")
    Q_MOC_INCLUDE("planfocusmodel.h")
    Q_MOC_INCLUDE("planweekmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString date READ date WRITE setDate NOTIFY weekChanged)
    Q_PROPERTY(QString squad READ squad NOTIFY weekChanged)
    Q_PROPERTY(QString weekTitle READ weekTitle NOTIFY weekChanged)
    /// Why the week has no microcycle (no fixtures), with what to do; empty otherwise.
    Q_PROPERTY(QString weekNote READ weekNote NOTIFY weekChanged)
    /// The last "go to date" that could not be read, in plain words; empty otherwise.
    Q_PROPERTY(QString dateError READ dateError NOTIFY dateErrorChanged)
    Q_PROPERTY(pitchloop::desktop::PlanWeekModel* days READ days CONSTANT)

    Q_PROPERTY(QString selectedDate READ selectedDate NOTIFY dayChanged)
    Q_PROPERTY(QString selectedDayText READ selectedDayText NOTIFY dayChanged)
    /// "MD-3 · cap 4 · high", or a note when the day has no microcycle.
    Q_PROPERTY(QString selectedDayDetail READ selectedDayDetail NOTIFY dayChanged)
    Q_PROPERTY(bool selectedHasSession READ selectedHasSession NOTIFY dayChanged)
    /// The fixture on the selected day, for the fixture form: {date, kickoff, opponent, venue,
    /// competition}; empty when the day has none.
    Q_PROPERTY(QVariantMap selectedFixture READ selectedFixture NOTIFY dayChanged)
    /// How the selected day's saved session went: "Held · 17 players took part", "Not yet
    /// marked held, changed or cancelled", "Cancelled"; empty without a session.
    Q_PROPERTY(QString selectedOutcomeText READ selectedOutcomeText NOTIFY dayChanged)
    /// The selected day's session can be marked: it is saved and its day has come.
    Q_PROPERTY(bool selectedCanMark READ selectedCanMark NOTIFY dayChanged)
    /// The chosen day's saved session: "90 min · 18 players", and its drills one a line.
    Q_PROPERTY(QString selectedSessionText READ selectedSessionText NOTIFY dayChanged)
    Q_PROPERTY(QString selectedDrillsText READ selectedDrillsText NOTIFY dayChanged)
    /// The chosen day's saved session as minutes and players, to start the form from.
    Q_PROPERTY(QString suggestedMinutes READ suggestedMinutes NOTIFY dayChanged)
    Q_PROPERTY(QString suggestedPlayers READ suggestedPlayers NOTIFY dayChanged)

    Q_PROPERTY(bool busy READ busy NOTIFY busyChanged)
    Q_PROPERTY(bool hasPlan READ hasPlan NOTIFY planChanged)
    Q_PROPERTY(QString planDate READ planDate NOTIFY planChanged)
    /// "MD-3 · cap 4 (high) · 85 of 90 minutes · 18 players"
    Q_PROPERTY(QString planSummary READ planSummary NOTIFY planChanged)
    /// What the plan lacks, e.g. a session left short and what the drill book would need.
    Q_PROPERTY(QString planNotes READ planNotes NOTIFY planChanged)
    /// Why the planner gave no session, in plain words; empty with a plan.
    Q_PROPERTY(QString problem READ problem NOTIFY planChanged)
    /// What the planner left out of its request (focuses it could not rank), one a line.
    Q_PROPERTY(QString notes READ notes NOTIFY planChanged)
    /// The coach's changes in force: "Pinned: … · Left out: …"; empty without any.
    Q_PROPERTY(QString adjustmentsText READ adjustmentsText NOTIFY planChanged)
    Q_PROPERTY(bool hasAdjustments READ hasAdjustments NOTIFY planChanged)
    /// Saving the proposed session replaces a saved one of the same day.
    Q_PROPERTY(bool planReplacesSaved READ planReplacesSaved NOTIFY planChanged)
    Q_PROPERTY(pitchloop::desktop::PlanBlockModel* blocks READ blocks CONSTANT)
    Q_PROPERTY(pitchloop::desktop::PlanFocusModel* focusMinutes READ focusMinutes CONSTANT)
    Q_PROPERTY(pitchloop::desktop::PlanDrillChoiceModel* drillChoices READ drillChoices CONSTANT)
    Q_PROPERTY(QString caution READ caution CONSTANT)

    /// The outcome of the last save or export, in plain words.
    Q_PROPERTY(QString message READ message NOTIFY messageChanged)
    Q_PROPERTY(bool messageIsError READ messageIsError NOTIFY messageChanged)
public:
    explicit PlannerView(QObject* parent = nullptr);
    ~PlannerView() override;

    QString date() const { return m_date; }
    void setDate(const QString& date);
    QString squad() const { return QString::fromStdString(m_squad); }
    QString weekTitle() const { return m_weekTitle; }
    QString weekNote() const { return m_weekNote; }
    QString dateError() const { return m_dateError; }
    PlanWeekModel* days() const { return m_days; }

    QString selectedDate() const { return m_selected; }
    QString selectedDayText() const { return m_selectedDayText; }
    QString selectedDayDetail() const { return m_selectedDayDetail; }
    bool selectedHasSession() const { return m_selectedHasSession; }
    QVariantMap selectedFixture() const { return m_selectedFixture; }
    QString selectedOutcomeText() const { return m_selectedOutcomeText; }
    bool selectedCanMark() const { return m_selectedCanMark; }
    QString selectedSessionText() const { return m_selectedSessionText; }
    QString selectedDrillsText() const { return m_selectedDrillsText; }
    QString suggestedMinutes() const { return m_suggestedMinutes; }
    QString suggestedPlayers() const { return m_suggestedPlayers; }

    bool busy() const { return m_busy; }
    bool hasPlan() const { return m_plan.has_value(); }
    QString planDate() const;
    QString planSummary() const { return m_planSummary; }
    QString planNotes() const { return m_planNotes; }
    QString problem() const { return m_problem; }
    QString notes() const { return m_notes; }
    QString adjustmentsText() const { return m_adjustmentsText; }
    bool hasAdjustments() const { return !m_pinned.empty() || !m_removed.empty(); }
    bool planReplacesSaved() const { return m_planReplacesSaved; }
    PlanBlockModel* blocks() const { return m_blocks; }
    PlanFocusModel* focusMinutes() const { return m_focusMinutes; }
    PlanDrillChoiceModel* drillChoices() const { return m_drillChoices; }
    QString caution() const;
    QString message() const { return m_message; }
    bool messageIsError() const { return m_messageIsError; }

    /// Shows the week of `text` (YYYY-MM-DD) and chooses that day; false (and dateError) when
    /// it is not a calendar date.
    Q_INVOKABLE bool goToDate(const QString& text);
    Q_INVOKABLE void goToToday();
    Q_INVOKABLE void previousWeek();
    Q_INVOKABLE void nextWeek();
    /// Chooses a day of the shown week; a proposal for another day is dropped.
    Q_INVOKABLE void selectDay(const QString& date);

    /// Asks the planner for the chosen day's session with these minutes and players (whole
    /// numbers), keeping the coach's pins and removals of that day. Runs off the window's
    /// thread; false (with `problem` set) when an input is not a whole number or a run is
    /// already under way.
    Q_INVOKABLE bool propose(const QString& minutes, const QString& players);
    /// Pins a drill of the proposal (or unpins it) and plans again.
    Q_INVOKABLE bool togglePin(qint64 drillId);
    /// Leaves a drill out and plans again.
    Q_INVOKABLE bool removeDrill(qint64 drillId);
    /// Leaves `out` out, pins `in` (model::swapDrill) and plans again.
    Q_INVOKABLE bool swapDrill(qint64 out, qint64 in);
    /// Forgets the pins and removals and plans again.
    Q_INVOKABLE bool clearAdjustments();

    /// Saves the proposed session for the squad (replacing that day's saved session); `by` is
    /// who saves it. false with `message` when there is nothing to save or the write failed.
    Q_INVOKABLE bool save(const QString& by);
    /// The chosen day's saved session as the one-page PDF sheet.
    Q_INVOKABLE bool exportSheet(const QUrl& file);
    /// Imports the squad's fixtures from a CSV or JSON file (docs/planner.md): all or nothing,
    /// problems in the message naming the file, the line and the field.
    Q_INVOKABLE bool importFixtures(const QUrl& file);
    /// Adds or changes one fixture of the squad from the form. `originalDate` is the date it
    /// had (empty for a new one): moved to another date, the old one is removed once the new
    /// one is stored. Problems are named in the form's words and change nothing.
    Q_INVOKABLE bool saveFixture(const QString& originalDate, const QString& date, const QString& kickoff,
                                 const QString& opponent, const QString& venue, const QString& competition);
    /// Removes the squad's fixture on `date`.
    Q_INVOKABLE bool removeFixture(const QString& date);
    /// Records how the selected day's session went: "held", "changed" (with the minutes each
    /// block took, e.g. "10 12 0 10") or "cancelled", with the players who took part.
    Q_INVOKABLE bool markSession(const QString& outcome, const QString& players, const QString& blockMinutes,
                                 const QString& by);
    /// The week's saved sessions and the open focuses' review dates that fall in it as an
    /// iCalendar file; sessions start at `start` ("HH:MM").
    Q_INVOKABLE bool exportCalendar(const QUrl& file, const QString& start);
    /// "session-2026-09-29.pdf", "week-2026-09-28.ics": a file name to offer.
    Q_INVOKABLE QString suggestedFileName(const QString& kind) const;

signals:
    void weekChanged();
    void dateErrorChanged();
    void dayChanged();
    void busyChanged();
    void planChanged();
    void messageChanged();

protected:
    void refresh() override;

private:
    struct Outcome {
        model::PlanResult result;
        std::string failure; ///< an exception from the solver
    };

    void showWeekOf(const std::string& date);
    void fillWeek(model::ClubRepository& repo);
    void fillDrillChoices(model::ClubRepository& repo);
    void dropPlan();
    bool run();
    void finished();
    void showPlan();
    void setBusy(bool busy);
    void setMessage(const QString& text, bool error);
    void setDateError(const QString& text);
    model::ClubRepository* repository() const;

    QString m_date;           ///< as set (may be empty: today)
    std::string m_weekStart;  ///< Monday of the shown week
    std::string m_squad = "First team";
    QString m_weekTitle;
    QString m_weekNote;
    QString m_dateError;
    QString m_selected;
    QString m_selectedDayText;
    QString m_selectedDayDetail;
    bool m_selectedHasSession = false;
    QString m_selectedSessionText;
    QString m_selectedDrillsText;
    QString m_suggestedMinutes;
    QString m_suggestedPlayers;
    int m_selectedCap = -1;

    const void* m_repoSeen = nullptr; ///< the repository the plan state belongs to
    model::PlanRequest m_request;     ///< of the last run
    std::vector<std::int64_t> m_pinned;
    std::vector<std::int64_t> m_removed;
    std::optional<model::Plan> m_plan;
    QString m_problem;
    QString m_notes;
    QString m_planSummary;
    QString m_planNotes;
    QVariantMap m_selectedFixture;
    QString m_selectedOutcomeText;
    bool m_selectedCanMark = false;
    QString m_adjustmentsText;
    bool m_planReplacesSaved = false;
    bool m_busy = false;
    int m_generation = 0;
    int m_runGeneration = 0;
    QFutureWatcher<Outcome>* m_watcher;

    QString m_message;
    bool m_messageIsError = false;

    PlanWeekModel* m_days;
    PlanBlockModel* m_blocks;
    PlanFocusModel* m_focusMinutes;
    PlanDrillChoiceModel* m_drillChoices;
};

} // namespace pitchloop::desktop
