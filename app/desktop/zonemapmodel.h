#pragma once
// One metric's zones in one window, for a pitch heat map: value, where it sits on the colour
// scale, sample, interval, target and state, all as display-ready roles.

#include "countscale.h"
#include "repository.h"
#include "display.h"
#include "status.h"

#include <QAbstractListModel>
#include <QStringList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// One zone of a heat map, ready for display.
struct ZoneCell {
    int band = 0;
    int lane = 0;
    QString zoneName; ///< "Our left-back area (B2·L5)"
    bool hasValue = false;
    double value = 0;  ///< the zone's value pooled toward its neighbours (model/pooling.h)
    double scaled = 0; ///< the pooled value's position on the colour scale, 0..1
    double raw = 0;    ///< the zone's own num/den
    /// "This zone alone: 66.7% · n = 3": the raw value and sample, one hover away.
    QString rawText;
    /// The cell's colour from the value-suppressing palette (model/palette.h): its row from how
    /// wide the pooled interval is against the scale, its step from the pooled value.
    QString colour;
    bool darkText = false;  ///< text on the cell reads dark (a light colour)
    int certaintyRow = 0;   ///< the palette's row: 0 most certain … 3 too unsure to colour
    bool thin = false; ///< a share or exposure on fewer items than a target needs to be judged
    QString valueText;
    QString sampleText;
    QString intervalText;
    QString targetText;
    int state = 0; ///< ZoneState::Value
    QString stateText;
    QString certaintyText;
};

/// Builds the cells of one metric in one window from statuses; `domain` places values on the
/// colour scale. Each value is pooled toward its neighbours and the whole pitch on the statuses'
/// effective counts (model/pooling.h); the raw value is kept for the hover. Zones come in grid
/// order (band-major).
/// What a count map is read per (model/countscale.h): the scale, the window's exposure per
/// match in its unit, and the whole pitch's status in the same window (for shares). The default
/// reads every metric as it is.
struct MapScale {
    model::CountScale scale = model::CountScale::PerMatch;
    double exposure = 1;
    const model::ZoneStatus* wholePitch = nullptr;
    /// The scale applies to per-match counts only, and a share needs the whole pitch.
    bool appliesTo(model::MetricKind kind) const {
        return kind == model::MetricKind::Count && scale != model::CountScale::PerMatch &&
               (scale != model::CountScale::ShareOfTotal || wholePitch != nullptr);
    }
};

class SeasonData;

/// The scale of a count's map in one window of a season, ready for zoneCells: the season's
/// exposures (minutes, opponent passes) are read from the club file once per squad, season and
/// number of matches, and kept here.
class CountScaler {
public:
    /// `scale` for metric `metricId` over window `w` ending at match `focal` of `season`; the
    /// default MapScale (as judged) for PerMatch.
    MapScale scaleFor(model::CountScale scale, const model::ClubRepository& repo, const SeasonData& season,
                      std::size_t focal, const std::string& metricId, const model::Window& w);

private:
    std::string m_key;
    std::vector<model::MatchExposure> m_exposures;
};

/// The values zoneCells colours (each zone pooled toward its neighbours), for the colour scale's
/// domain; NaN for zones without data.
std::vector<double> pooledValues(const std::vector<const model::ZoneStatus*>& statuses,
                                 model::MetricKind kind, const model::ZoneGrid& grid, const MapScale& scale = {});

std::vector<ZoneCell> zoneCells(const std::vector<const model::ZoneStatus*>& statuses,
                                model::MetricKind kind, const ScaleDomain& domain,
                                const model::ZoneGrid& grid, const MapScale& scale = {});

/// The zones of one metric in one window (the whole pitch is a property, not a row).
class ZoneMapModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("Page controllers fill zone maps")
    Q_PROPERTY(QString title READ title NOTIFY changed)
    Q_PROPERTY(QString subtitle READ subtitle NOTIFY changed)
    /// The whole pitch in one line: "Whole pitch 41.5% · n = 600 · target ≥ 40.0% · On target".
    Q_PROPERTY(QString wholePitchText READ wholePitchText NOTIFY changed)
    Q_PROPERTY(int wholePitchState READ wholePitchState NOTIFY changed)
    /// Labels of the colour scale, evenly spaced from its low end to its high end.
    Q_PROPERTY(QStringList scaleLabels READ scaleLabels NOTIFY changed)
    Q_PROPERTY(QString levelText READ levelText NOTIFY changed)
    Q_PROPERTY(int count READ count NOTIFY changed)
public:
    enum Role {
        BandRole = Qt::UserRole + 1,
        LaneRole,
        ZoneNameRole,
        HasValueRole,
        ValueRole,
        ScaledRole,
        ThinRole,
        ValueTextRole,
        SampleTextRole,
        IntervalTextRole,
        TargetTextRole,
        StateRole,
        StateTextRole,
        CertaintyTextRole,
        RawRole,
        RawTextRole,
        ColourRole,
        DarkTextRole,
        CertaintyRowRole,
    };
    Q_ENUM(Role)

    explicit ZoneMapModel(QObject* parent = nullptr);

    struct Header {
        QString title;
        QString subtitle;
        QString wholePitchText;
        int wholePitchState = 0;
        QStringList scaleLabels;
        QString levelText;
    };
    void reset(Header header, std::vector<ZoneCell> cells);
    void clear();

    QString title() const { return m_header.title; }
    QString subtitle() const { return m_header.subtitle; }
    QString wholePitchText() const { return m_header.wholePitchText; }
    int wholePitchState() const { return m_header.wholePitchState; }
    QStringList scaleLabels() const { return m_header.scaleLabels; }
    QString levelText() const { return m_header.levelText; }
    int count() const { return static_cast<int>(m_cells.size()); }

    /// The roles of one zone by name (empty when the map has no such zone).
    Q_INVOKABLE QVariantMap zone(int band, int lane) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void changed();

private:
    Header m_header;
    std::vector<ZoneCell> m_cells;
};

/// "Whole pitch 41.5% · n = 600 · target ≥ 40.0% · On target".
QString wholePitchLine(const model::ZoneStatus& s, model::MetricKind kind);

} // namespace pitchloop::desktop
