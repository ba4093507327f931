#pragma once
// The season's targets, zone by zone, and the editor that changes them (the targets page):
// pick zones on the pitch, set one metric's target for all of them as new versions, retire,
// copy last season's, undo the last change; beside each zone its target in force and last
// season's achieved value; the selected zone's history.

#include "sessionclient.h"
#include "targets.h"
#include "zones.h"

#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

#include <optional>
#include <string>
#include <vector>

namespace pitchloop::desktop {

class PitchGeometry;
class TargetHistoryModel;
class TargetZoneModel;
class ZoneMapModel;

/// A number typed into the target form: "45", "45%", "0,5". With `percent` the text is a
/// percentage and comes back as a share (45 → 0.45); without it a trailing "%" is refused.
/// nullopt when the text is not such a number.
std::optional<double> parseFormNumber(const QString& text, bool percent);

/// Inputs: season (empty: the latest season with matches), metricId (empty: the first metric)
/// and today (ISO date; default the app clock, todayIso()), which picks the date targets are shown for.
class TargetsView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("pitchgeometry.h")
    Q_MOC_INCLUDE("targethistorymodel.h")
    Q_MOC_INCLUDE("targetzonemodel.h")
    Q_MOC_INCLUDE("zonemapmodel.h")
    QML_ELEMENT
    Q_PROPERTY(QString season READ season WRITE setSeason NOTIFY seasonChanged)
    Q_PROPERTY(QString metricId READ metricId WRITE setMetricId NOTIFY metricIdChanged)
    Q_PROPERTY(QString today READ today WRITE setToday NOTIFY todayChanged)
    Q_PROPERTY(QStringList seasonOptions READ seasonOptions NOTIFY changed)
    Q_PROPERTY(int seasonRow READ seasonRow NOTIFY changed)
    Q_PROPERTY(int metricRow READ metricRow NOTIFY changed)
    Q_PROPERTY(bool hasMetric READ hasMetric NOTIFY changed)
    Q_PROPERTY(QString metricName READ metricName NOTIFY changed)
    Q_PROPERTY(QString betterText READ betterText NOTIFY changed)
    Q_PROPERTY(bool isRate READ isRate NOTIFY changed)
    /// What the value field holds: "%", "a match", "per exposure event".
    Q_PROPERTY(QString unitText READ unitText NOTIFY changed)
    Q_PROPERTY(QString marginUnitText READ marginUnitText NOTIFY changed)
    Q_PROPERTY(QString sampleUnitText READ sampleUnitText NOTIFY changed)
    /// "Targets in force on Wed 2 Dec 2026".
    Q_PROPERTY(QString asOfText READ asOfText NOTIFY changed)
    Q_PROPERTY(QString previousSeason READ previousSeason NOTIFY changed)
    Q_PROPERTY(bool hasPreviousSeason READ hasPreviousSeason NOTIFY changed)
    /// "Small figures: 2025-26 achieved over its 30 matches" or why there is nothing to show.
    Q_PROPERTY(QString lastSeasonText READ lastSeasonText NOTIFY changed)
    Q_PROPERTY(QString wholePitchTargetText READ wholePitchTargetText NOTIFY changed)
    Q_PROPERTY(QString wholePitchLastSeasonText READ wholePitchLastSeasonText NOTIFY changed)
    Q_PROPERTY(bool canCopy READ canCopy NOTIFY changed)
    Q_PROPERTY(QString copyText READ copyText NOTIFY changed)
    Q_PROPERTY(pitchloop::desktop::PitchGeometry* geometry READ geometry CONSTANT)
    Q_PROPERTY(pitchloop::desktop::TargetZoneModel* zones READ zones CONSTANT)
    /// Last season's achieved values as a heat map (empty without a last season).
    Q_PROPERTY(pitchloop::desktop::ZoneMapModel* lastSeasonMap READ lastSeasonMap CONSTANT)
    Q_PROPERTY(pitchloop::desktop::TargetHistoryModel* history READ history CONSTANT)

    // Selection
    /// Selected zones as "band,lane" in grid order ("0,0" for the whole pitch).
    Q_PROPERTY(QStringList selectedZones READ selectedZones NOTIFY selectionChanged)
    Q_PROPERTY(int selectedCount READ selectedCount NOTIFY selectionChanged)
    Q_PROPERTY(bool wholePitchSelected READ wholePitchSelected NOTIFY selectionChanged)
    /// "Band 2 · lane 5", "Whole pitch", "3 zones selected" or "no zone selected".
    Q_PROPERTY(QString selectionText READ selectionText NOTIFY selectionChanged)
    /// The zone whose history is listed (the last one clicked).
    Q_PROPERTY(QString focusText READ focusText NOTIFY selectionChanged)
    Q_PROPERTY(QString focusTargetText READ focusTargetText NOTIFY selectionChanged)

    // The form: what the user types, kept when a save fails.
    Q_PROPERTY(QString valueText READ valueText WRITE setValueText NOTIFY formChanged)
    /// 0: at least, 1: at most.
    Q_PROPERTY(int direction READ direction WRITE setDirection NOTIFY formChanged)
    Q_PROPERTY(QString marginText READ marginText WRITE setMarginText NOTIFY formChanged)
    Q_PROPERTY(QString minSampleText READ minSampleText WRITE setMinSampleText NOTIFY formChanged)
    Q_PROPERTY(QString rationale READ rationale WRITE setRationale NOTIFY formChanged)
    Q_PROPERTY(QString author READ author WRITE setAuthor NOTIFY formChanged)
    Q_PROPERTY(QString effectiveFrom READ effectiveFrom WRITE setEffectiveFrom NOTIFY formChanged)
    /// Every reason the last save, retire or copy was refused, one a line; empty after success.
    Q_PROPERTY(QString formError READ formError NOTIFY messagesChanged)
    /// What the last write did.
    Q_PROPERTY(QString statusText READ statusText NOTIFY messagesChanged)
    Q_PROPERTY(bool canUndo READ canUndo NOTIFY undoChanged)
    Q_PROPERTY(QString undoText READ undoText NOTIFY undoChanged)
public:
    explicit TargetsView(QObject* parent = nullptr);

    QString season() const { return m_season; }
    void setSeason(const QString& season);
    QString metricId() const { return m_metricId; }
    void setMetricId(const QString& id);
    QString today() const { return m_today; }
    void setToday(const QString& isoDate);
    QStringList seasonOptions() const { return m_seasonOptions; }
    int seasonRow() const { return static_cast<int>(m_seasonOptions.indexOf(m_season)); }
    int metricRow() const { return m_metricRow; }
    bool hasMetric() const { return m_kind.has_value(); }
    QString metricName() const { return m_metricName; }
    QString betterText() const { return m_betterText; }
    bool isRate() const { return m_kind == model::MetricKind::Rate; }
    QString unitText() const;
    QString marginUnitText() const;
    QString sampleUnitText() const;
    QString asOfText() const;
    QString previousSeason() const { return m_previousSeason; }
    bool hasPreviousSeason() const { return m_hasPreviousSeason; }
    QString lastSeasonText() const { return m_lastSeasonText; }
    QString wholePitchTargetText() const { return m_wholePitchTarget; }
    QString wholePitchLastSeasonText() const { return m_wholePitchLastSeason; }
    bool canCopy() const { return m_copyCount > 0; }
    QString copyText() const;
    PitchGeometry* geometry() const { return m_geometry; }
    TargetZoneModel* zones() const { return m_zones; }
    ZoneMapModel* lastSeasonMap() const { return m_lastSeasonMap; }
    TargetHistoryModel* history() const { return m_history; }

    QStringList selectedZones() const;
    int selectedCount() const { return static_cast<int>(m_selected.size()); }
    bool wholePitchSelected() const;
    QString selectionText() const;
    QString focusText() const;
    QString focusTargetText() const;

    QString valueText() const { return m_valueText; }
    void setValueText(const QString& text);
    int direction() const { return m_direction; }
    void setDirection(int direction);
    QString marginText() const { return m_marginText; }
    void setMarginText(const QString& text);
    QString minSampleText() const { return m_minSampleText; }
    void setMinSampleText(const QString& text);
    QString rationale() const { return m_rationale; }
    void setRationale(const QString& text);
    QString author() const { return m_author; }
    void setAuthor(const QString& text);
    QString effectiveFrom() const { return m_effectiveFrom; }
    void setEffectiveFrom(const QString& text);
    QString formError() const { return m_formError; }
    QString statusText() const { return m_statusText; }
    bool canUndo() const { return m_undo.has_value(); }
    QString undoText() const;

    /// A click: the zone alone, or with `additive` (Shift) added to the selection — or taken
    /// out when it is already in. (0, 0) is the whole pitch, always alone.
    Q_INVOKABLE void selectZone(int band, int lane, bool additive);
    /// A dragged rectangle from one zone to another: every zone between, alone or added.
    Q_INVOKABLE void selectArea(int band1, int lane1, int band2, int lane2, bool additive);
    Q_INVOKABLE void clearSelection();

    /// One new version per selected zone from the form. False, with formError, when refused.
    Q_INVOKABLE bool save();
    /// Ends the selected zones' targets from the form's date (author and rationale from it).
    Q_INVOKABLE bool retire();
    /// Carries last season's targets into this season (author from the form).
    Q_INVOKABLE bool copyFromPreviousSeason();
    /// Undoes the last change made here (save, retire or copy) with new versions that put back
    /// what was in force before it. One level: an undo cannot itself be undone.
    Q_INVOKABLE bool undo();

signals:
    void seasonChanged();
    void metricIdChanged();
    void todayChanged();
    void changed();
    void selectionChanged();
    void formChanged();
    void messagesChanged();
    void undoChanged();

protected:
    void refresh() override;

private:
    struct Undo {
        QString description;
        std::string squad;
        std::string season;
        std::vector<model::Target> before; ///< the season's versions before the change
        std::vector<model::Target> added;  ///< as stored, with recordedAt and version ids
    };

    void clear();
    void selectionUpdated(bool refill);
    void fillForm();
    void markEdited();
    void setMessages(const QString& error, const QString& status);
    std::string asOf() const;
    std::vector<model::Target> versionsOf(int band, int lane) const;
    /// Stores `versions` as one change that can be undone, then reloads the session.
    void write(std::vector<model::Target> versions, const QString& description);
    bool isSelected(int band, int lane) const;

    QString m_season;
    QString m_metricId;
    QString m_today;
    std::string m_squad = "First team";
    QString m_clubFile;
    QStringList m_seasonOptions;
    int m_metricRow = -1;
    std::optional<model::MetricKind> m_kind;
    QString m_itemsWord; ///< what a rate metric counts: "losses", "passes" (model/wording)
    model::Direction m_defaultDirection = model::Direction::AtLeast;
    QString m_metricName;
    QString m_betterText;
    QString m_previousSeason;
    bool m_hasPreviousSeason = false;
    QString m_lastSeasonText;
    QString m_wholePitchTarget;
    QString m_wholePitchLastSeason;
    int m_copyCount = 0;
    std::vector<model::Target> m_versions; ///< the season's stored versions, every metric
    PitchGeometry* m_geometry;
    TargetZoneModel* m_zones;
    ZoneMapModel* m_lastSeasonMap;
    TargetHistoryModel* m_history;

    std::vector<model::Zone> m_selected; ///< {0, 0}: the whole pitch
    model::Zone m_focus{0, 0};
    bool m_hasFocus = false;

    QString m_valueText;
    int m_direction = 0;
    QString m_marginText;
    QString m_minSampleText;
    QString m_rationale;
    QString m_author;
    QString m_effectiveFrom;
    bool m_edited = false;   ///< the user typed since the form was last filled
    bool m_needsFill = true; ///< fill the form at the next refresh (metric or season changed)
    QString m_formError;
    QString m_statusText;
    std::optional<Undo> m_undo;
};

} // namespace pitchloop::desktop
