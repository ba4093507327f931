#pragma once
// The settings page: the open club file (and opening another), the zone grid, the judged
// window, the flag thresholds and the microcycle intensity caps. The form keeps what was typed
// until a save succeeds; a save can be undone (the earlier values are written back).

#include "fixtures.h"
#include "sessionclient.h"
#include "status.h"

#include <QString>
#include <QUrl>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

class IntensityCapModel;

class SettingsView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("intensitycapmodel.h")
    QML_ELEMENT
    /// "6 bands × 5 lanes (equal:6x5)".
    Q_PROPERTY(QString gridText READ gridText NOTIFY storedChanged)

    // The form: texts as typed, choices as indexes.
    Q_PROPERTY(QString levelText READ levelText WRITE setLevelText NOTIFY formChanged)
    /// 0 Wilson, 1 Jeffreys.
    Q_PROPERTY(int intervalMethod READ intervalMethod WRITE setIntervalMethod NOTIFY formChanged)
    /// 0 the last N matches, 1 the season so far, 2 EWMA, 3 this match alone.
    Q_PROPERTY(int windowKind READ windowKind WRITE setWindowKind NOTIFY formChanged)
    Q_PROPERTY(QString windowNText READ windowNText WRITE setWindowNText NOTIFY formChanged)
    Q_PROPERTY(QString lambdaText READ lambdaText WRITE setLambdaText NOTIFY formChanged)
    Q_PROPERTY(QString offThresholdText READ offThresholdText WRITE setOffThresholdText NOTIFY formChanged)
    Q_PROPERTY(QString watchThresholdText READ watchThresholdText WRITE setWatchThresholdText NOTIFY formChanged)
    Q_PROPERTY(bool fdr READ fdr WRITE setFdr NOTIFY formChanged)
    Q_PROPERTY(QString fdrQText READ fdrQText WRITE setFdrQText NOTIFY formChanged)
    /// The season's alarm budget: about this many false off-target flags a season across the board.
    Q_PROPERTY(QString budgetText READ budgetText WRITE setBudgetText NOTIFY formChanged)
    Q_PROPERTY(QString seasonMatchesText READ seasonMatchesText WRITE setSeasonMatchesText NOTIFY formChanged)
    Q_PROPERTY(bool matchVariation READ matchVariation WRITE setMatchVariation NOTIFY formChanged)
    Q_PROPERTY(QString budgetDefault READ budgetDefault CONSTANT)
    Q_PROPERTY(pitchloop::desktop::IntensityCapModel* caps READ caps CONSTANT)
    /// The form differs from the stored settings.
    Q_PROPERTY(bool edited READ edited NOTIFY formChanged)

    /// "Default 0.90 (90%)", one a field, from model/'s defaults.
    Q_PROPERTY(QString levelDefault READ levelDefault CONSTANT)
    Q_PROPERTY(QString windowDefault READ windowDefault CONSTANT)
    Q_PROPERTY(QString offDefault READ offDefault CONSTANT)
    Q_PROPERTY(QString watchDefault READ watchDefault CONSTANT)
    Q_PROPERTY(QString fdrDefault READ fdrDefault CONSTANT)
    /// The flags as stored now, in one sentence.
    Q_PROPERTY(QString ruleText READ ruleText NOTIFY storedChanged)

    /// Why the last save or undo failed, one problem a line; empty otherwise.
    Q_PROPERTY(QString problems READ problems NOTIFY resultChanged)
    /// What the last save, undo or file change did.
    Q_PROPERTY(QString message READ message NOTIFY resultChanged)
    Q_PROPERTY(bool canUndo READ canUndo NOTIFY resultChanged)
    Q_PROPERTY(QString undoText READ undoText NOTIFY resultChanged)
public:
    explicit SettingsView(QObject* parent = nullptr);

    QString gridText() const { return m_gridText; }
    QString levelText() const { return m_form.level; }
    void setLevelText(const QString& t);
    int intervalMethod() const { return m_form.interval; }
    void setIntervalMethod(int m);
    int windowKind() const { return m_form.windowKind; }
    void setWindowKind(int k);
    QString windowNText() const { return m_form.windowN; }
    void setWindowNText(const QString& t);
    QString lambdaText() const { return m_form.lambda; }
    void setLambdaText(const QString& t);
    QString offThresholdText() const { return m_form.off; }
    void setOffThresholdText(const QString& t);
    QString watchThresholdText() const { return m_form.watch; }
    void setWatchThresholdText(const QString& t);
    bool fdr() const { return m_form.fdr; }
    void setFdr(bool on);
    QString fdrQText() const { return m_form.fdrQ; }
    void setFdrQText(const QString& t);
    QString budgetText() const { return m_form.budget; }
    void setBudgetText(const QString& t);
    QString seasonMatchesText() const { return m_form.seasonMatches; }
    void setSeasonMatchesText(const QString& t);
    bool matchVariation() const { return m_form.variation; }
    void setMatchVariation(bool on);
    QString budgetDefault() const;
    IntensityCapModel* caps() const { return m_caps; }
    bool edited() const;

    QString levelDefault() const;
    QString windowDefault() const;
    QString offDefault() const;
    QString watchDefault() const;
    QString fdrDefault() const;
    QString ruleText() const { return m_ruleText; }

    QString problems() const { return m_problems; }
    QString message() const { return m_message; }
    bool canUndo() const { return !m_undo.empty(); }
    QString undoText() const;

    /// Checks the form by the model's rules; writes the flag settings and the caps when all is
    /// well (and the club file is reloaded so every page recomputes). With a problem nothing is
    /// written and the form keeps what was typed.
    Q_INVOKABLE bool save();
    /// Writes back the values the last save replaced.
    Q_INVOKABLE bool undo();
    /// Puts the stored values back in the form.
    Q_INVOKABLE void revert();
    /// Opens another club file and remembers it for the next start; on failure the open file
    /// stays open and `problems` says why.
    Q_INVOKABLE bool openClubFile(const QUrl& file);

signals:
    void storedChanged();
    void formChanged();
    void resultChanged();

protected:
    void refresh() override;

private:
    /// The form's contents (caps live in the cap model).
    struct Form {
        QString level, windowN, lambda, off, watch, fdrQ, budget, seasonMatches;
        int interval = 0;
        int windowKind = 0;
        bool fdr = false;
        bool variation = true;
        bool operator==(const Form&) const = default;
    };
    /// Settings as stored: the flags and the caps together.
    struct Stored {
        model::FlagSettings flags;
        model::IntensityCaps caps;
    };

    static Form formOf(const model::FlagSettings& f);
    bool write(const Stored& values);
    void loadForm();
    void setResult(const QString& problems, const QString& message);
    template <typename T> void setField(T& field, const T& value);

    const void* m_repoSeen = nullptr;
    Stored m_stored;
    Form m_form;
    Form m_loadedForm;
    QStringList m_loadedCaps;
    QString m_gridText;
    QString m_ruleText;
    QString m_problems;
    QString m_message;
    std::vector<Stored> m_undo; ///< values before each save, the latest last
    bool m_reloadForm = true;
    IntensityCapModel* m_caps;
};

} // namespace pitchloop::desktop
