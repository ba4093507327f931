#pragma once
// The coaches' drill book (docs/drills.md): drill notes kept in the club file with every
// earlier version and reversible deletes, searchable by text, tag, metric and zone, and
// exchanged as JSON files of our own shape.

#include "metricspec.h"
#include "problem.h"
#include "zones.h"

#include <cstdint>
#include <nlohmann/json_fwd.hpp>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

class ClubRepository;

/// Intensity of a drill on a 1–5 scale: 1 recovery, 2 light, 3 moderate, 4 high, 5 maximal.
/// The five steps are common practice among coaches (no published source); what load a
/// player takes is decided by the club's qualified staff, not by this number.
inline constexpr int kIntensityMin = 1;
inline constexpr int kIntensityMax = 5;

/// "recovery", "light", "moderate", "high", "maximal"; "" outside 1–5.
std::string_view intensityName(int level);

/// A drill's part in a session, when its author says so: a warm-up or cool-down routine, or a
/// main drill. Unset (Any), the planner reads the tags `warm_up` / `cool_down` (however spelt).
enum class DrillRole { Any, WarmUp, Main, CoolDown };
/// "warm_up", "main", "cool_down"; "" for Any (the drills file's `role` key).
std::string_view toString(DrillRole r);
std::optional<DrillRole> drillRoleFromString(std::string_view s);

/// Limits checked by validateDrill (docs/drills.md).
inline constexpr int kDrillMinutesMax = 180;
inline constexpr int kDrillPlayersMax = 40;
inline constexpr double kDrillAreaLengthMaxM = 120; ///< the longest pitch Law 1 allows
inline constexpr double kDrillAreaWidthMaxM = 90;   ///< the widest pitch Law 1 allows

/// One drill note. The content fields are what a coach writes; the book-keeping fields at the
/// end are filled by DrillBook when it reads a drill back and are ignored when it writes one.
struct Drill {
    std::string title;
    std::string purpose;
    std::string organisation; ///< set-up and rules, free text (may span lines)
    std::vector<std::string> coachingPoints;
    int durationMin = 0;
    int intensity = 0; ///< kIntensityMin–kIntensityMax
    int playersMin = 0;
    int playersMax = 0;
    double areaLengthM = 0; ///< 0 × 0: no area given
    double areaWidthM = 0;
    std::vector<std::string> equipment;
    std::vector<std::string> metrics; ///< metric ids the drill works on
    std::vector<Zone> zones;          ///< zones of the club grid it works on
    std::vector<std::string> tags;
    DrillRole role = DrillRole::Any; ///< its part in a session, when set (else the tags say)
    std::string author;

    std::int64_t id = 0;   ///< 0 before it is stored
    std::string createdAt; ///< when the drill was first added (ISO 8601 UTC)
    std::string editedAt;  ///< when this version was written
    std::string editedBy;  ///< who wrote this version
    int versionCount = 0;  ///< versions so far (in a history: up to and including this one)
    bool deleted = false;  ///< removed from the book (restorable)
    /// When this version was written on another zone grid (its name, e.g. "equal:6x5"), and
    /// `zones` are its zones read on the club's grid (mapZones); empty otherwise.
    std::string zonesGrid;

    bool hasArea() const { return areaLengthM != 0 || areaWidthM != 0; }
    /// Same content (every field a coach writes); the book-keeping fields are not compared.
    bool sameContent(const Drill& other) const;
};

/// The drill's content as one object of the drills file (snake_case keys, docs/drills.md).
void to_json(nlohmann::json& j, const Drill& d);
/// Reads what to_json wrote (stored bodies); throws nlohmann::json exceptions on a wrong shape.
/// User files go through parseDrillFile, which reports problems instead.
void from_json(const nlohmann::json& j, Drill& d);

/// The content fields that differ between two versions, by drills-file key ("title",
/// "duration_min", "players", "area_m", "zones", ...): changed or added keys in alphabetical
/// order, then keys the later version no longer has.
std::vector<std::string> changedFields(const Drill& before, const Drill& after);

/// Checks a drill's content: title and author given, 1–180 minutes, intensity 1–5, 1–40
/// players with min ≤ max, area (when given) 1–120 × 1–90 m, known metric ids, zones inside
/// `grid`, texts well-formed UTF-8 (any script or emoji is fine and is kept byte for byte).
/// Problems name `source` and the field by its file key (e.g. "players.min", "zones[1]").
Problems validateDrill(const Drill& drill, const std::vector<MetricSpec>& metrics,
                       const ZoneGrid& grid, const std::string& source);

/// ASCII letters lowered, every other byte kept (so UTF-8 text stays intact). SQLite's
/// lower() does the same; neither folds the case of accented or non-Latin letters.
std::string asciiLower(std::string_view text);

/// The lower-cased text a text search looks in: title, purpose, organisation, coaching
/// points and tags (each tag also with '_' read as a space), one per line.
std::string drillSearchText(const Drill& drill);

/// Drills file: {"format": "pitchloop-drills", "version": 1, "drills": [...]}. Any problem
/// leaves `drills` empty: a file with an error imports nothing.
struct DrillFileResult {
    std::vector<Drill> drills;
    Problems errors;
};
DrillFileResult parseDrillFile(std::string_view jsonText, const std::string& source,
                               const std::vector<MetricSpec>& metrics, const ZoneGrid& grid);

/// Reads one drill object (as in a drills file; a drills file holding exactly one drill is
/// read as that drill) over `base`: keys present replace fields of `base`, keys absent keep
/// them. With `complete`, title, author, duration_min, intensity and players must be present.
/// The result is validated.
struct DrillObjectResult {
    Drill drill;
    Problems errors;
};
DrillObjectResult parseDrillObject(std::string_view jsonText, const std::string& source,
                                   const Drill& base, bool complete,
                                   const std::vector<MetricSpec>& metrics, const ZoneGrid& grid);

/// The drills file of `drills` (content only: no ids, dates or history), ending in a newline.
std::string writeDrillFile(const std::vector<Drill>& drills);

/// What a drill book write did: the drill's id, or why nothing changed. A problem about the
/// drill as a whole ("no drill 17", "drill 17 is deleted") has only a message.
struct DrillChange {
    std::int64_t id = 0;
    Problems problems;
    bool changed = false; ///< false for an edit that gives the content the drill already has
    bool ok() const { return problems.empty(); }
};

/// Filters of a search; empty ones match everything, given ones must all match.
struct DrillQuery {
    std::string text;         ///< every word appears (ASCII case ignored) in drillSearchText
    std::string tag;          ///< one of the tags (ASCII case ignored)
    std::string metric;       ///< one of the metric ids
    std::optional<Zone> zone; ///< one of the zones
    bool includeDeleted = false;
};

struct DrillImport {
    std::vector<std::int64_t> added;
    int skipped = 0; ///< already in the book (a live drill with the same content)
    Problems errors; ///< when not empty, nothing was added
};

/// The drill book stored in a club file (tables drill and drill_version). Every edit adds a
/// version; deletes set a date and can be undone. Storage faults throw StorageError.
class DrillBook {
  public:
    explicit DrillBook(ClubRepository& repo);

    /// Stores a new drill; `who` wrote it, `now` is an ISO 8601 UTC time. Validated against
    /// the club's metrics and grid; problems name `source`.
    DrillChange add(const Drill& drill, const std::string& who, const std::string& now,
                    const std::string& source = "drill");
    /// Adds a version with `drill`'s content to drill `id` (earlier versions are kept). An
    /// edit that changes nothing adds no version; a deleted drill must be restored first.
    DrillChange edit(std::int64_t id, const Drill& drill, const std::string& who,
                     const std::string& now, const std::string& source = "drill");
    /// The latest version, deleted or not; nullopt for an unknown id.
    std::optional<Drill> get(std::int64_t id) const;
    /// Every version, oldest first; empty for an unknown id.
    std::vector<Drill> history(std::int64_t id) const;
    /// Latest versions by id.
    std::vector<Drill> list(bool includeDeleted = false) const;
    std::vector<Drill> search(const DrillQuery& query) const;
    /// Marks a drill deleted at `now`; restore() undoes it. Nothing is erased.
    DrillChange remove(std::int64_t id, const std::string& now);
    DrillChange restore(std::int64_t id);

    /// Adds the drills that are not already live in the book (same content) in one
    /// transaction; each first version is credited to the drill's author. Validated first:
    /// with any problem nothing is added (problems name `source` and "drills[i]").
    DrillImport importDrills(const std::vector<Drill>& drills, const std::string& now,
                             const std::string& source = "drills");

    std::vector<MetricSpec> metrics() const;
    ZoneGrid grid() const;

  private:
    std::vector<Drill> query(const std::string& where, const std::vector<std::string>& words,
                             std::optional<std::int64_t> id) const;
    std::int64_t insert(const Drill& drill, const std::string& who, const std::string& now);
    void addVersion(std::int64_t id, const Drill& drill, const std::string& who,
                    const std::string& now);

    ClubRepository& m_repo;
};

} // namespace pitchloop::model
