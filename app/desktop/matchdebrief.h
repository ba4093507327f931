#pragma once
// A match judged against the season's targets (the debrief page): one metric's zones in this
// match and over the judged window, and every slipped or watched target, most certain first.

#include "countscale.h"
#include "zonemapmodel.h"
#include "sessionclient.h"

#include <QString>

#include <memory>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class DebriefListModel;
class SeasonData;
class PitchGeometry;
class ZoneMapModel;

/// Inputs: matchId (empty: the latest match) and metricId (empty: the metric of the most
/// certain slip, else the first metric). Both are filled in with what is shown.
class MatchDebrief : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("debrieflistmodel.h")
    Q_MOC_INCLUDE("pitchgeometry.h")
    Q_MOC_INCLUDE("zonemapmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString matchId READ matchId WRITE setMatchId NOTIFY matchIdChanged)
    Q_PROPERTY(QString metricId READ metricId WRITE setMetricId NOTIFY metricIdChanged)
    /// What a count metric's maps are read per: "match", "per90", "per_opponent_passes" or
    /// "share" (model/countscale.h); other metrics ignore it.
    Q_PROPERTY(QString countScale READ countScale WRITE setCountScale NOTIFY countScaleChanged)
    /// Whether the metric is a per-match count (the scale choice applies).
    Q_PROPERTY(bool scalable READ scalable NOTIFY changed)
    /// "a match", "per 90 minutes", ...: what the maps' values are, for their key.
    Q_PROPERTY(QString scaleText READ scaleText NOTIFY changed)
    /// The zone picked on both maps: the most certain flag of the shown metric when the match or
    /// metric changes, else what the user picks; (0, 0) for none.
    Q_PROPERTY(int selectedBand READ selectedBand NOTIFY selectionChanged)
    Q_PROPERTY(int selectedLane READ selectedLane NOTIFY selectionChanged)
    /// Rows of the shown match and metric in the session's match and metric lists.
    Q_PROPERTY(int matchRow READ matchRow NOTIFY changed)
    Q_PROPERTY(int metricRow READ metricRow NOTIFY changed)
    Q_PROPERTY(bool hasMatch READ hasMatch NOTIFY changed)
    Q_PROPERTY(bool hasTargets READ hasTargets NOTIFY changed)
    Q_PROPERTY(QString matchTitle READ matchTitle NOTIFY changed)
    Q_PROPERTY(QString metricName READ metricName NOTIFY changed)
    Q_PROPERTY(QString metricQuestion READ metricQuestion NOTIFY changed)
    Q_PROPERTY(QString betterText READ betterText NOTIFY changed)
    Q_PROPERTY(QString windowText READ windowText NOTIFY changed)
    Q_PROPERTY(QString judgedText READ judgedText NOTIFY changed)
    /// The same note in the coach's words, without the statistics.
    Q_PROPERTY(QString plainJudgedText READ plainJudgedText NOTIFY changed)
    /// What the last export did, in plain words, and whether it failed.
    Q_PROPERTY(QString exportMessage READ exportMessage NOTIFY exportDone)
    Q_PROPERTY(bool exportFailed READ exportFailed NOTIFY exportDone)
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* matchMap READ matchMap CONSTANT)
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* windowMap READ windowMap CONSTANT)
    Q_PROPERTY(pitchloop::desktop::DebriefListModel* items READ items CONSTANT)
    Q_PROPERTY(pitchloop::desktop::PitchGeometry* geometry READ geometry CONSTANT)
public:
    explicit MatchDebrief(QObject* parent = nullptr);

    QString matchId() const { return m_matchId; }
    void setMatchId(const QString& id);
    QString metricId() const { return m_metricId; }
    void setMetricId(const QString& id);
    QString countScale() const { return m_countScale; }
    void setCountScale(const QString& scale);
    bool scalable() const { return m_scalable; }
    QString scaleText() const { return m_scaleText; }
    int selectedBand() const { return m_selectedBand; }
    int selectedLane() const { return m_selectedLane; }
    Q_INVOKABLE void selectZone(int band, int lane);

    /// The match's debrief as a PDF (the same sheet the command line exports).
    Q_INVOKABLE bool exportPdf(const QUrl& file);
    /// Every zone's value, interval and state at this match in the club's windows, as CSV
    /// (docs/exports.md: the same bytes as the command line's statuses export).
    Q_INVOKABLE bool exportStatusesCsv(const QUrl& file);
    /// The match's stored tallies on the club grid, as CSV (docs/exports.md).
    Q_INVOKABLE bool exportTalliesCsv(const QUrl& file);
    /// "debrief-KB-2026-08.pdf", "statuses-KB-2026-08.csv", "tallies-KB-2026-08.csv".
    Q_INVOKABLE QString suggestedFileName(const QString& kind) const;
    QString exportMessage() const { return m_exportMessage; }
    bool exportFailed() const { return m_exportFailed; }
    int matchRow() const { return m_matchRow; }
    int metricRow() const { return m_metricRow; }
    bool hasMatch() const { return m_matchRow >= 0; }
    bool hasTargets() const { return m_hasTargets; }
    QString matchTitle() const { return m_matchTitle; }
    QString metricName() const { return m_metricName; }
    QString metricQuestion() const { return m_metricQuestion; }
    QString betterText() const { return m_betterText; }
    QString windowText() const { return m_windowText; }
    QString judgedText() const { return m_judgedText; }
    QString plainJudgedText() const { return m_plainJudgedText; }
    ZoneMapModel* matchMap() const { return m_matchMap; }
    ZoneMapModel* windowMap() const { return m_windowMap; }
    DebriefListModel* items() const { return m_items; }
    PitchGeometry* geometry() const { return m_geometry; }

signals:
    void countScaleChanged();
    void matchIdChanged();
    void metricIdChanged();
    void selectionChanged();
    void changed();
    void exportDone();

protected:
    void refresh() override;

private:
    void clear();
    void clearModels();
    void exported(const QString& message, bool failed);
    /// Writes `bytes` to the chosen file (atomically), reporting `what` it wrote.
    bool writeExport(const QUrl& file, const std::string& bytes, const QString& what);

    QString m_matchId;
    QString m_metricId;
    QString m_countScale = QStringLiteral("match");
    bool m_scalable = false;
    QString m_scaleText;
    CountScaler m_scaler;
    int m_selectedBand = 0;
    int m_selectedLane = 0;
    QString m_selectionFor; ///< match and metric the selection was made for
    /// The season and match the debrief list was built for: it does not depend on the metric,
    /// so a metric switch keeps it (the season object is replaced when the club file reloads).
    std::shared_ptr<const SeasonData> m_itemsSeason;
    std::size_t m_itemsFocal = 0;
    int m_matchRow = -1;
    int m_metricRow = -1;
    bool m_hasTargets = false;
    QString m_matchTitle;
    QString m_metricName;
    QString m_metricQuestion;
    QString m_betterText;
    QString m_windowText;
    QString m_judgedText, m_plainJudgedText;
    QString m_exportMessage;
    bool m_exportFailed = false;
    ZoneMapModel* m_matchMap;
    ZoneMapModel* m_windowMap;
    DebriefListModel* m_items;
    PitchGeometry* m_geometry;
};

} // namespace pitchloop::desktop
