#pragma once
// One zone's trend for one metric over a season (the zone page): each match's value, the judged
// window's value and interval, the EWMA and the target in force, match by match, and the
// focuses the zone has had.

#include "countscale.h"
#include "zonemapmodel.h"
#include "metricspec.h"
#include "sessionclient.h"

#include <QString>
#include <QStringList>
#include <QVariantList>
#include <QtQml/qqmlregistration.h>

#include <string>
#include <vector>

namespace pitchloop::desktop {

class PitchGeometry;
class SeriesModel;
class ZoneMapModel;

/// Inputs: metricId, band and lane (0, 0: the whole pitch), and
/// matchId (empty: the latest match), whose season is drawn and whose judged window the
/// summary and the zone picker show. Until a metric is chosen, the page opens on the latest
/// open focus of that season (its metric and first zone), else on the zone of the chosen
/// match's most certain flag, else on the first metric's whole pitch.
class ZoneSeries : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("pitchgeometry.h")
    Q_MOC_INCLUDE("seriesmodel.h")
    Q_MOC_INCLUDE("zonemapmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString metricId READ metricId WRITE setMetricId NOTIFY selectionChanged)
    Q_PROPERTY(int band READ band WRITE setBand NOTIFY selectionChanged)
    Q_PROPERTY(int lane READ lane WRITE setLane NOTIFY selectionChanged)
    Q_PROPERTY(QString matchId READ matchId WRITE setMatchId NOTIFY selectionChanged)
    /// What a count's picker map is read per: "match", "per90", "per_opponent_passes", "share"
    /// (model/countscale.h); the summary and the chart stay per match, as judged.
    Q_PROPERTY(QString countScale READ countScale WRITE setCountScale NOTIFY selectionChanged)
    Q_PROPERTY(bool scalable READ scalable NOTIFY changed)
    Q_PROPERTY(QString scaleText READ scaleText NOTIFY changed)
    Q_PROPERTY(int metricRow READ metricRow NOTIFY changed)
    Q_PROPERTY(bool hasSeries READ hasSeries NOTIFY changed)
    Q_PROPERTY(QString zoneText READ zoneText NOTIFY changed)
    Q_PROPERTY(QString metricName READ metricName NOTIFY changed)
    Q_PROPERTY(QString metricQuestion READ metricQuestion NOTIFY changed)
    Q_PROPERTY(QString betterText READ betterText NOTIFY changed)
    Q_PROPERTY(QString seasonText READ seasonText NOTIFY changed)
    Q_PROPERTY(QString windowText READ windowText NOTIFY changed)
    Q_PROPERTY(QString ewmaText READ ewmaText NOTIFY changed)
    Q_PROPERTY(QString levelText READ levelText NOTIFY changed)
    /// When a zone is flagged, in one sentence from the club's flag settings.
    Q_PROPERTY(QString ruleText READ ruleText NOTIFY changed)
    /// Row of `matchId` in the series (the summary's match).
    Q_PROPERTY(int focalRow READ focalRow NOTIFY changed)
    Q_PROPERTY(QString summaryTitle READ summaryTitle NOTIFY changed)
    Q_PROPERTY(QString summaryValue READ summaryValue NOTIFY changed)
    Q_PROPERTY(QString summaryDetail READ summaryDetail NOTIFY changed)
    Q_PROPERTY(QString summaryTarget READ summaryTarget NOTIFY changed)
    Q_PROPERTY(int summaryState READ summaryState NOTIFY changed)
    Q_PROPERTY(QString summaryStateText READ summaryStateText NOTIFY changed)
    Q_PROPERTY(QString summaryCertainty READ summaryCertainty NOTIFY changed)
    /// "This match alone: 42.0% · n = 143" and "EWMA, λ 0.30: 41.8%" at the chosen match.
    Q_PROPERTY(QString summaryMatchText READ summaryMatchText NOTIFY changed)
    /// "On the map, pulled toward its neighbours: 0.9": the zone's pooled value as the map
    /// colours it (model/pooling.h); empty for the whole pitch or without data.
    Q_PROPERTY(QString summaryPooledText READ summaryPooledText NOTIFY changed)
    Q_PROPERTY(QString summaryEwmaText READ summaryEwmaText NOTIFY changed)
    /// The judged window's value in the coach's words (model/wording.h); empty without one.
    Q_PROPERTY(QString summaryCoachText READ summaryCoachText NOTIFY changed)
    /// The focuses this zone has had for this metric in the season, on the chart: a list of
    /// {label: "F1", startRow, endRow (-1 while open), closed}; rows index the series.
    Q_PROPERTY(QVariantList focusSpans READ focusSpans NOTIFY changed)
    /// The same in words, one focus a line ("F1 · #1 opened after KB-2026-08 by … · closed …").
    Q_PROPERTY(QStringList focusLines READ focusLines NOTIFY changed)
    Q_PROPERTY(pitchloop::desktop::SeriesModel* series READ series CONSTANT)
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* map READ map CONSTANT)
    Q_PROPERTY(pitchloop::desktop::PitchGeometry* geometry READ geometry CONSTANT)
public:
    explicit ZoneSeries(QObject* parent = nullptr);

    QString metricId() const { return m_metricId; }
    void setMetricId(const QString& id);
    int band() const { return m_band; }
    void setBand(int band);
    int lane() const { return m_lane; }
    void setLane(int lane);
    QString matchId() const { return m_matchId; }
    void setMatchId(const QString& id);
    QString countScale() const { return m_countScale; }
    void setCountScale(const QString& scale);
    bool scalable() const { return m_scalable; }
    QString scaleText() const { return m_scaleText; }
    /// Sets every input at once and recomputes once.
    Q_INVOKABLE void select(const QString& metricId, int band, int lane, const QString& matchId = {});

    int metricRow() const { return m_metricRow; }
    bool hasSeries() const { return m_hasSeries; }
    QString zoneText() const { return m_zoneText; }
    QString metricName() const { return m_metricName; }
    QString metricQuestion() const { return m_metricQuestion; }
    QString betterText() const { return m_betterText; }
    QString seasonText() const { return m_seasonText; }
    QString windowText() const { return m_windowText; }
    QString ewmaText() const { return m_ewmaText; }
    QString levelText() const { return m_levelText; }
    QString ruleText() const { return m_ruleText; }
    int focalRow() const { return m_focalRow; }
    QString summaryTitle() const { return m_summaryTitle; }
    QString summaryValue() const { return m_summaryValue; }
    QString summaryDetail() const { return m_summaryDetail; }
    QString summaryTarget() const { return m_summaryTarget; }
    int summaryState() const { return m_summaryState; }
    QString summaryStateText() const { return m_summaryStateText; }
    QString summaryCertainty() const { return m_summaryCertainty; }
    QString summaryMatchText() const { return m_summaryMatchText; }
    QString summaryPooledText() const { return m_summaryPooledText; }
    QString summaryEwmaText() const { return m_summaryEwmaText; }
    QString summaryCoachText() const { return m_summaryCoachText; }
    QVariantList focusSpans() const { return m_focusSpans; }
    QStringList focusLines() const { return m_focusLines; }
    SeriesModel* series() const { return m_series; }
    ZoneMapModel* map() const { return m_map; }
    PitchGeometry* geometry() const { return m_geometry; }

signals:
    void selectionChanged();
    void changed();

protected:
    void refresh() override;

private:
    void clear();
    /// The season's focuses on this metric and zone, placed on the series' rows.
    void showFocuses(const model::MetricSpec& metric, const std::string& squad,
                     const std::string& seasonName, const std::vector<std::string>& rowDates);

    QString m_metricId;
    int m_band = 0;
    int m_lane = 0;
    QString m_matchId;
    int m_metricRow = -1;
    bool m_hasSeries = false;
    QString m_zoneText;
    QString m_metricName;
    QString m_metricQuestion;
    QString m_betterText;
    QString m_seasonText;
    QString m_windowText;
    QString m_ewmaText;
    QString m_levelText;
    QString m_ruleText;
    int m_focalRow = -1;
    QString m_summaryTitle;
    QString m_summaryValue;
    QString m_summaryDetail;
    QString m_summaryTarget;
    int m_summaryState = 0;
    QString m_summaryStateText;
    QString m_summaryCertainty;
    QString m_summaryMatchText;
    QString m_countScale = QStringLiteral("match");
    bool m_scalable = false;
    QString m_scaleText;
    CountScaler m_scaler;
    QString m_summaryPooledText;
    QString m_summaryEwmaText;
    QString m_summaryCoachText;
    QVariantList m_focusSpans;
    QStringList m_focusLines;
    SeriesModel* m_series;
    ZoneMapModel* m_map;
    PitchGeometry* m_geometry;
};

} // namespace pitchloop::desktop
