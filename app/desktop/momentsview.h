#pragma once
// The moments behind a zone's number on the zone page (docs/moments.md): the list, arrows for a
// small pitch, and clip lists for a video player written from the page.

#include "moments.h"
#include "sessionclient.h"

#include <QAbstractListModel>
#include <QString>
#include <QUrl>
#include <QVariantList>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One row a moment, in time order.
class MomentListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The zone page fills its moments")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        MatchIdRole = Qt::UserRole + 1,
        ClockTextRole,   ///< "2nd 28:00 (73:00)"
        WhatRole,        ///< what happened, from the events
        CountsRole,      ///< model::MomentCount as an int
        CountsTextRole,  ///< "won back", "not counted" ... in the metric's words
        PlayersTextRole, ///< "Players 7, 5, 4"
        FromXRole,       ///< the arrow in drawing metres (PitchGeometry's frame)
        FromYRole,
        ToXRole,
        ToYRole,
        HasArrowRole,
    };
    Q_ENUM(Role)

    explicit MomentListModel(QObject* parent = nullptr);
    /// `pitch` is the match's size, to turn our frame into PitchGeometry's drawing metres.
    void reset(const std::vector<model::Moment>& moments, const model::Pitch& pitch, double margin);
    int count() const { return static_cast<int>(m_moments.size()); }

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<model::Moment> m_moments;
    model::Pitch m_pitch;
    double m_margin = 2.5;
};

/// Inputs: metricId, band and lane (0, 0: the whole pitch), matchId and whether the window is
/// the match alone or the club's judged window. Outputs: the moments and a summary line; clip
/// lists of the match alone are written with lead-in, lead-out and where the second half starts
/// in the video.
class MomentsView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(QString metricId MEMBER m_metricId WRITE setMetricId NOTIFY inputsChanged)
    Q_PROPERTY(int band MEMBER m_band WRITE setBand NOTIFY inputsChanged)
    Q_PROPERTY(int lane MEMBER m_lane WRITE setLane NOTIFY inputsChanged)
    Q_PROPERTY(QString matchId MEMBER m_matchId WRITE setMatchId NOTIFY inputsChanged)
    /// false: the match alone; true: the club's judged window up to the match.
    Q_PROPERTY(bool judgedWindow MEMBER m_judgedWindow WRITE setJudgedWindow NOTIFY inputsChanged)
    Q_PROPERTY(pitchloop::desktop::MomentListModel* moments READ moments CONSTANT)
    /// Whose moments: "" everyone, "unit:left_side" a unit of ours, "player:7" one of our players.
    Q_PROPERTY(QString filter MEMBER m_filter WRITE setFilter NOTIFY inputsChanged)
    /// The choices for `filter`: [{text: "Everyone", value: ""}, {text: "Our left side", value:
    /// "unit:left_side"}, ..., {text: "7 E. Tansley", value: "player:7"}] from the squad list.
    Q_PROPERTY(QVariantList filterChoices READ filterChoices NOTIFY changed)
    /// "11 moments in this match, all of them in the number: 11 a match."
    Q_PROPERTY(QString summaryText READ summaryText NOTIFY changed)
    /// "This match" / "Last 5 matches", the two window choices' titles.
    Q_PROPERTY(QString matchWindowText READ matchWindowText NOTIFY changed)
    Q_PROPERTY(QString judgedWindowText READ judgedWindowText NOTIFY changed)
    /// A clip list is one video: only for the match alone.
    Q_PROPERTY(bool canSaveClips READ canSaveClips NOTIFY changed)
    Q_PROPERTY(double leadIn MEMBER m_leadIn NOTIFY clipSettingsChanged)
    Q_PROPERTY(double leadOut MEMBER m_leadOut NOTIFY clipSettingsChanged)
    /// Where the 2nd half starts in the video, "[hh:]mm:ss"; empty: right after the 1st.
    Q_PROPERTY(QString secondHalfStart MEMBER m_secondHalfStart NOTIFY clipSettingsChanged)
    Q_PROPERTY(QString exportMessage READ exportMessage NOTIFY exportDone)
    Q_PROPERTY(bool exportFailed READ exportFailed NOTIFY exportDone)
public:
    explicit MomentsView(QObject* parent = nullptr);

    void setMetricId(const QString& id);
    void setBand(int band);
    void setLane(int lane);
    void setMatchId(const QString& id);
    void setJudgedWindow(bool judged);
    void setFilter(const QString& filter);
    QVariantList filterChoices() const { return m_filterChoices; }
    MomentListModel* moments() const { return m_list; }
    QString summaryText() const { return m_summary; }
    QString matchWindowText() const;
    QString judgedWindowText() const;
    bool canSaveClips() const { return !m_judgedWindow && m_list->count() > 0; }
    QString exportMessage() const { return m_exportMessage; }
    bool exportFailed() const { return m_exportFailed; }

    /// Writes the clip list: `format` "vtt" (WebVTT chapters) or "csv"; false with a message
    /// naming what is wrong (a bad time, a file that cannot be written), nothing written then.
    Q_INVOKABLE bool saveClips(const QUrl& file, const QString& format);
    Q_INVOKABLE QString suggestedFileName(const QString& format) const;

signals:
    void inputsChanged();
    void changed();
    void clipSettingsChanged();
    void exportDone();

protected:
    void refresh() override;

private:
    void exported(const QString& message, bool failed);

    QString m_metricId;
    int m_band = 0;
    int m_lane = 0;
    QString m_matchId;
    bool m_judgedWindow = false;
    QString m_filter;
    QVariantList m_filterChoices;
    double m_leadIn = 8;
    double m_leadOut = 4;
    QString m_secondHalfStart;
    QString m_clockFor; ///< the match whose remembered video clock the field shows
    MomentListModel* m_list;
    QString m_summary;
    QString m_exportMessage;
    bool m_exportFailed = false;
};

} // namespace pitchloop::desktop
