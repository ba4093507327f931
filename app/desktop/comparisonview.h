#pragma once
// Two sets of a season's matches on one map (model/comparison.h), on the zone page: home against
// away, before against from a date, one opponent against the rest; each zone's difference in the
// diverging value-suppressing palette, with both sides and how sure one hover away.

#include "sessionclient.h"

#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class PitchGeometry;
class ZoneMapModel;

class ComparisonView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("pitchgeometry.h")
    Q_MOC_INCLUDE("zonemapmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString metricId MEMBER m_metricId WRITE setMetricId NOTIFY inputsChanged)
    /// The season of this match is compared.
    Q_PROPERTY(QString matchId MEMBER m_matchId WRITE setMatchId NOTIFY inputsChanged)
    /// "venue", "date:YYYY-MM-DD" or "opponent:NAME" (model::parseSplit).
    Q_PROPERTY(QString split MEMBER m_split WRITE setSplit NOTIFY inputsChanged)
    /// The season's opponents, for the opponent choice.
    Q_PROPERTY(QStringList opponents READ opponents NOTIFY changed)
    /// "Regain within 5 s: away (17 matches) against home (17 matches) …", or what is wrong.
    Q_PROPERTY(QString summaryText READ summaryText NOTIFY changed)
    /// The zones with the strongest evidence of a difference, one a line.
    Q_PROPERTY(QStringList strongest READ strongest NOTIFY changed)
    /// The key's ends: "away lower" … "away higher".
    Q_PROPERTY(QString lowText READ lowText NOTIFY changed)
    Q_PROPERTY(QString highText READ highText NOTIFY changed)
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* map READ map CONSTANT)
public:
    explicit ComparisonView(QObject* parent = nullptr);

    void setMetricId(const QString& id);
    void setMatchId(const QString& id);
    void setSplit(const QString& split);
    QStringList opponents() const { return m_opponents; }
    QString summaryText() const { return m_summary; }
    QStringList strongest() const { return m_strongest; }
    QString lowText() const { return m_lowText; }
    QString highText() const { return m_highText; }
    ZoneMapModel* map() const { return m_map; }

signals:
    void inputsChanged();
    void changed();

protected:
    void refresh() override;

private:
    QString m_metricId;
    QString m_matchId;
    QString m_split = QStringLiteral("venue");
    QStringList m_opponents;
    QString m_summary;
    QStringList m_strongest;
    QString m_lowText;
    QString m_highText;
    ZoneMapModel* m_map;
};

} // namespace pitchloop::desktop
