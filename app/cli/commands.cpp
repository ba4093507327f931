#include "commands.h"

#include "common.h"
#include "compare_verbs.h"
#include "drills_verbs.h"
#include "export_verbs.h"
#include "focus_verbs.h"
#include "moments_verbs.h"
#include "plan_verbs.h"
#include "squad_verbs.h"
#include "verbs.h"

#include "format.h"
#include "clock.h"
#include "ingest.h"
#include "profilestore.h"
#include "metricspec.h"
#include "repository.h"

#include <CLI/CLI.hpp>
#include <nlohmann/json.hpp>

#include <cstdlib>
#include <filesystem>
#include <iostream>
#include <set>
#include <unistd.h>

namespace pitchloop::cli {

using namespace pitchloop::model;
namespace fs = std::filesystem;

namespace {

/// The match details given on the command line (they override the profile and the file name).
struct DetailOptions {
    std::string id, date, opponent, venue, competition, us, periodLengths;
    MatchDetails details() const {
        MatchDetails d;
        const std::pair<const char*, const std::string*> all[] = {
            {"id", &id}, {"date", &date}, {"opponent", &opponent}, {"venue", &venue},
            {"competition", &competition}, {"us", &us}, {"period_lengths", &periodLengths}};
        for (const auto& [key, value] : all)
            if (!value->empty()) d.values[key] = *value;
        return d;
    }
    void add(CLI::App* cmd) {
        cmd->add_option("--match-id", id, "With --profile: the match id (else the profile or file name)");
        cmd->add_option("--date", date, "With --profile: the match date YYYY-MM-DD");
        cmd->add_option("--opponent", opponent, "With --profile: the opponent's name");
        cmd->add_option("--venue", venue, "With --profile: home, away or neutral");
        cmd->add_option("--competition", competition, "With --profile: the competition");
        cmd->add_option("--us", us, "With --profile: our club's name as the match calls it");
        cmd->add_option("--period-lengths", periodLengths,
                        "With --profile: the periods' lengths in seconds, e.g. 2831,2904");
    }
};

/// The command line's own advice for problems whose words name no option (the model's messages
/// are shown by the app too, which gives its own): how to give match details, map a foreign
/// event type.
void printHints(const Problems& errors, std::ostream& err) {
    std::set<std::string> details;
    bool foreignType = false;
    for (const Problem& e : errors) {
        if (e.place == "match" && e.message.rfind("not given", 0) == 0)
            details.insert(e.field == "id" ? "--match-id" : "--" + e.field);
        foreignType |= e.field == "type" && e.message.rfind("unknown event type", 0) == 0;
    }
    if (!details.empty()) {
        std::string flags;
        for (const auto& f : details) flags += (flags.empty() ? "" : ", ") + f;
        err << "hint: " << flags << " give" << (details.size() == 1 ? "s" : "") << " it on the command line\n";
    }
    if (foreignType) err << "hint: --map-type NAME=TYPE reads a foreign event type as one of ours\n";
}

/// A profile from its file, or the problems on stderr.
std::optional<MappingProfile> loadProfile(const std::string& path, std::ostream& err) {
    ProfileResult p = readProfileFile(path);
    for (const auto& e : p.errors) err << "error: " << e.describe() << "\n";
    return p.profile;
}

/// --profile names a file, or else a profile saved in the club file.
std::optional<MappingProfile> profileByPathOrName(const Globals& g, const std::string& given,
                                                  std::ostream& err) {
    if (fs::exists(given)) return loadProfile(given, err);
    auto repo = openClub(g);
    if (const auto saved = ProfileStore(*repo).get(given)) {
        ProfileResult p = parseProfile(saved->text, given);
        for (const auto& e : p.errors) err << "error: " << e.describe() << "\n";
        return p.profile;
    }
    err << "error: --profile " << given << ": no such file, and no profile of that name is saved "
        << "in the club file (pitchloop profile list)\n";
    return std::nullopt;
}

int cmdIngest(const Globals& g, const std::vector<std::string>& files, const IngestOptions& opts,
              const std::optional<MappingProfile>& profile, const MatchDetails& details,
              std::ostream& err) {
    auto repo = openClub(g);
    const bool progress = files.size() > 1 && isatty(STDERR_FILENO);
    int added = 0, replaced = 0, unchanged = 0, failed = 0;
    for (std::size_t i = 0; i < files.size(); ++i) {
        if (progress)
            err << "\r\033[K[" << i + 1 << "/" << files.size() << "] " << files[i] << std::flush;
        // A table without --profile is read with the saved profile whose columns it has.
        std::optional<MappingProfile> found = profile;
        if (!found && looksLikeTable(files[i])) {
            std::string bytes;
            try {
                bytes = readFileBytes(files[i]);
            } catch (const IoError&) {
            }
            if (const auto saved = profileFor(bytes, ProfileStore(*repo).list())) {
                found = parseProfile(saved->text, saved->name).profile;
                err << files[i] << ": read with the saved profile '" << saved->name << "'\n";
            }
        }
        const std::vector<IngestReport> reports =
            found ? ingestTableFile(*repo, files[i], *found, details, opts)
                  : std::vector<IngestReport>{ingestFile(*repo, files[i], opts)};
        for (const IngestReport& r : reports) {
            if (progress && (!r.ok() || !r.warnings.empty())) err << "\r\033[K";
            for (const auto& w : r.warnings) err << "warning: " << w.describe() << "\n";
            switch (r.status) {
            case IngestStatus::Added: ++added; break;
            case IngestStatus::Replaced: ++replaced; break;
            case IngestStatus::Unchanged: ++unchanged; break;
            case IngestStatus::Invalid:
            case IngestStatus::Refused:
                ++failed;
                for (const auto& e : r.errors) err << "error: " << e.describe() << "\n";
                err << r.file << (r.matchId.empty() ? "" : " (match " + r.matchId + ")")
                    << ": not ingested; the club file is unchanged by it\n";
                // The command line's own advice (the model's messages name no option: the app
                // shows them too, with its own).
                if (r.status == IngestStatus::Refused)
                    err << "hint: --replace replaces the stored match with this file\n";
                printHints(r.errors, err);
                break;
            }
            if (!progress && r.ok())
                err << toString(r.status) << ": " << r.matchId << " (" << r.events << " events) from "
                    << r.file << "\n";
        }
    }
    if (progress) err << "\r\033[K";
    err << added << " added, " << replaced << " replaced, " << unchanged << " unchanged, "
        << failed << " failed\n";
    return failed ? kExitBadInput : kExitOk;
}

int cmdProfileCheck(const std::string& profilePath, const std::string& file,
                    const MatchDetails& details, std::ostream& out, std::ostream& err) {
    const auto profile = loadProfile(profilePath, err);
    if (!profile) return kExitBadInput;
    std::string bytes;
    try {
        bytes = readFileBytes(file);
    } catch (const IoError& e) {
        err << "error: " << file << ": " << e.what() << "\n";
        return kExitBadInput;
    }
    const std::vector<MappedTable> all = mapFileMatches(bytes, *profile, details, file);
    Problems errors, warnings;
    out << "profile " << (profile->name.empty() ? profilePath : profile->name) << " on " << file
        << " (" << toString(profile->table.layout) << ", " << toString(profile->encoding) << ")\n";
    for (const MappedTable& mapped : all) {
        errors.insert(errors.end(), mapped.errors.begin(), mapped.errors.end());
        warnings.insert(warnings.end(), mapped.warnings.begin(), mapped.warnings.end());
        if (mapped.errors.empty()) {
            // The same checks a native match file gets, storing nothing.
            const ReadResult read = parseMatchDocument(mapped.match, file);
            const auto more = inTableTerms(read.errors, mapped, *profile);
            errors.insert(errors.end(), more.begin(), more.end());
            const auto w = inTableTerms(read.warnings, mapped, *profile);
            warnings.insert(warnings.end(), w.begin(), w.end());
        }
        if (mapped.match.contains("events")) {
            const auto& m = mapped.match["match"];
            out << "match " << m.value("id", "?") << "  " << m.value("date", "?") << "  "
                << m.value("us", "?") << " v " << m.value("opponent", "?") << " ("
                << m.value("venue", "?") << "), frame " << m.value("frame", "?");
            if (m.contains("zone_only"))
                out << ", zone-only on " << m["zone_only"].value("grid", "?")
                    << " (each event at its zone's centre)";
            out << "\n";
            const auto& events = mapped.match["events"];
            out << events.size() << " events, " << mapped.skipped << " rows skipped; the first mapped:\n";
            for (std::size_t i = 0; i < events.size() && i < (all.size() > 1 ? 2u : 5u); ++i)
                out << "  " << mapped.rowPlaces[i] << ": " << events[i].dump() << "\n";
            out << "by side and type:\n";
            for (const auto& [key, n] : mapped.countsByType)
                out << "  " << key << std::string(key.size() < 20 ? 20 - key.size() : 1, ' ') << n << "\n";
        }
        for (const auto& u : mapped.unmapped)
            out << "unmapped: '" << u.word << "' in " << u.column << " (" << u.count << "×)\n";
    }
    for (const auto& w : warnings) err << "warning: " << w.describe() << "\n";
    for (const auto& e : errors) err << "error: " << e.describe() << "\n";
    printHints(errors, err);
    if (!errors.empty()) {
        err << file << ": the profile does not read it cleanly (" << errors.size() << " problem"
            << (errors.size() == 1 ? "" : "s") << "); nothing was stored\n";
        return kExitBadInput;
    }
    err << file << ": reads cleanly; nothing was stored (load it with: pitchloop ingest --profile "
        << profilePath << " " << file << ")\n";
    return kExitOk;
}

int cmdMatches(const Globals& g, const std::string& format, std::ostream& out) {
    auto repo = openClub(g);
    const auto matches = repo->matches();
    if (format == "csv") {
        out << "match_id,date,competition,venue,opponent,goals_us,goals_opp,squad,season,events\n";
        for (const auto& m : matches)
            out << csvField(m.id) << ',' << m.date << ',' << csvField(m.competition) << ','
                << m.venue << ',' << csvField(m.opponent) << ','
                << (m.goalsUs ? std::to_string(*m.goalsUs) : "") << ','
                << (m.goalsOpp ? std::to_string(*m.goalsOpp) : "") << ',' << csvField(m.squad)
                << ',' << m.season << ',' << m.eventCount << "\n";
        return kExitOk;
    }
    for (const auto& m : matches) {
        char line[256];
        std::snprintf(line, sizeof line, "%-12s %s  %-5s %-24s %-8s %5d events  %s %s\n",
                      m.id.c_str(), m.date.c_str(), m.venue.c_str(), m.opponent.c_str(),
                      scoreLine(m).c_str(), m.eventCount, m.squad.c_str(), m.season.c_str());
        out << line;
        if (!m.zoneOnlyGrid.empty())
            out << "             zone-only: positions known only to grid " << m.zoneOnlyGrid << "\n";
    }
    if (matches.empty()) out << "(no matches yet: pitchloop ingest FILE.json)\n";
    return kExitOk;
}

/// The grid named by --grid, or the club's stored grid when none is given.
std::optional<ZoneGrid> chooseGrid(const ClubRepository& repo, const std::string& text,
                                   std::ostream& err) {
    if (text.empty()) return repo.tallyGrid();
    auto grid = ZoneGrid::parse(text);
    if (!grid)
        err << "error: --grid " << text << ": expected equal:BANDSxLANES (e.g. equal:6x5) or "
            << "markings:BANDS (lanes cut at the penalty- and goal-area lines)\n";
    return grid;
}

int cmdTallies(const Globals& g, const std::string& format, const std::string& match,
               const std::string& metric, const std::string& gridText, std::ostream& out,
               std::ostream& err) {
    auto repo = openClub(g);
    const auto grid = chooseGrid(*repo, gridText, err);
    if (!grid) return kExitBadInput;
    if (!match.empty() && !repo->sourceOf(match)) {
        err << "error: no match '" << match << "' in " << g.db << "\n";
        return kExitBadInput;
    }
    if (!metric.empty() && !repo->metric(metric)) {
        err << "error: no metric '" << metric << "' (see: pitchloop metrics list)\n";
        return kExitBadInput;
    }
    const auto rows = repo->talliesOnGrid(*grid, match.empty() ? std::nullopt : std::optional(match),
                                          metric.empty() ? std::nullopt : std::optional(metric));
    // Zone-only matches that this grid cannot know: said, not guessed (docs/import.md).
    for (const auto& m : repo->matches()) {
        if (!match.empty() && m.id != match) continue;
        if (const std::string note = m.zoneOnlyNote(*grid); !note.empty())
            err << "note: match " << m.id << ": " << note << " (no rows for it)\n";
    }
    if (format == "csv") {
        out << talliesCsv(rows);
    } else {
        for (const auto& r : rows) {
            char line[160];
            std::snprintf(line, sizeof line, "%-12s %-24s band %d lane %d  %5ld / %-5ld\n",
                          r.matchId.c_str(), r.metricId.c_str(), r.band, r.lane, r.num, r.den);
            out << line;
        }
    }
    return kExitOk;
}

int cmdMetricsList(const Globals& g, std::ostream& out) {
    auto repo = openClub(g);
    for (const auto& m : repo->metrics()) {
        char line[256];
        std::snprintf(line, sizeof line, "%-26s %-9s %-7s %s\n", m.id.c_str(),
                      std::string(toString(m.kind())).c_str(),
                      std::string(toString(m.better)).c_str(), m.name.c_str());
        out << line;
    }
    return kExitOk;
}

int cmdMetricsShow(const Globals& g, const std::string& id, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    auto m = repo->metric(id);
    if (!m) {
        err << "error: no metric '" << id << "'\n";
        return kExitBadInput;
    }
    out << nlohmann::json::parse(m->json).dump(2) << "\n";
    return kExitOk;
}

int cmdMetricsAdd(const Globals& g, const std::string& file, bool replace, std::ostream& err) {
    std::string text;
    try {
        text = readFileBytes(file);
    } catch (const IoError& e) {
        err << "error: " << file << ": cannot be read\n";
        return kExitBadInput;
    }
    auto [specs, problems] = parseMetricFile(text, file);
    if (!problems.empty()) {
        for (const auto& p : problems) err << "error: " << p.describe() << "\n";
        err << file << ": no metric added\n";
        return kExitBadInput;
    }
    auto repo = openClub(g);
    for (const auto& spec : specs) {
        for (const auto& b : builtinMetrics())
            if (b.id == spec.id) {
                err << "error: " << file << ": '" << spec.id
                    << "' is a built-in metric; give your variant its own id\n";
                return kExitBadInput;
            }
        if (repo->metric(spec.id) && !replace) {
            err << "error: " << file << ": metric '" << spec.id
                << "' exists; use --replace to redefine it (its tallies are recomputed)\n";
            return kExitBadInput;
        }
    }
    for (const auto& spec : specs) {
        repo->saveMetric(spec);
        err << "saved metric " << spec.id << " and recomputed its tallies\n";
    }
    return kExitOk;
}

} // namespace

int run(int argc, char** argv, std::ostream& out, std::ostream& err) {
    CLI::App app{"Pitchloop: zone targets, match debriefs, training focuses and follow-ups "
                 "for a football club's staff."};
    app.name("pitchloop");
    app.set_version_flag("--version", std::string("pitchloop ") + PITCHLOOP_VERSION);
    app.require_subcommand(1);
    Globals g;
    g.db = defaultClubFile();
    app.add_option("--db", g.db, "Club file (SQLite); default $PITCHLOOP_DB or the data folder")
        ->capture_default_str();

    auto* ingest = app.add_subcommand("ingest", "Load match files (one transaction per file)");
    std::vector<std::string> files;
    IngestOptions ingestOptions;
    std::vector<std::string> typeMaps;
    ingest->add_option("files", files, "Match files (JSON, format v1)")->required();
    ingest->add_flag("--replace", ingestOptions.replace,
                     "Replace stored matches that have the same id");
    ingest->add_option("--squad", ingestOptions.squad, "Squad the matches belong to")
        ->capture_default_str();
    ingest->add_option("--map-type", typeMaps,
                       "Read a foreign event type as one of ours, e.g. run=carry");
    std::string profilePath;
    ingest->add_option("--profile", profilePath,
                       "Read the files as tables with this mapping profile (docs/import.md)");
    DetailOptions ingestDetails;
    ingestDetails.add(ingest);

    auto* profileCmd = app.add_subcommand("profile", "Check a mapping profile against a table");
    profileCmd->require_subcommand(1);
    auto* profileCheck = profileCmd->add_subcommand(
        "check", "Print what the profile understands in a table, storing nothing");
    std::string checkProfile, checkFile;
    profileCheck->add_option("profile", checkProfile, "The mapping profile (JSON)")->required();
    profileCheck->add_option("file", checkFile, "A table it should read")->required();
    DetailOptions checkDetails;
    checkDetails.add(profileCheck);
    auto* profileSave = profileCmd->add_subcommand("save", "Save a profile in the club file under a name: "
                                                           "tables in its layout then load without --profile");
    std::string saveName, saveFile, saveBy;
    profileSave->add_option("name", saveName, "The name the staff know the layout by")->required();
    profileSave->add_option("file", saveFile, "The profile (JSON)")->required();
    profileSave->add_option("--by", saveBy, "Who saves it");
    auto* profileList = profileCmd->add_subcommand("list", "Profiles saved in the club file");
    auto* profileRemove = profileCmd->add_subcommand("remove", "Remove a saved profile");
    std::string removeProfile;
    profileRemove->add_option("name", removeProfile)->required();

    auto* matches = app.add_subcommand("matches", "List stored matches");
    std::string matchesFormat = "table";
    matches->add_option("--format", matchesFormat)->check(CLI::IsMember({"table", "csv"}));

    auto* tallies = app.add_subcommand("tallies", "Per-match, per-zone tallies of every metric");
    std::string talliesFormat = "table", talliesMatch, talliesMetric;
    tallies->add_option("--format", talliesFormat, "table or csv")
        ->check(CLI::IsMember({"table", "csv"}));
    tallies->add_option("--match", talliesMatch, "Only this match id");
    tallies->add_option("--metric", talliesMetric, "Only this metric id");
    std::string talliesGrid;
    tallies->add_option("--grid", talliesGrid,
                        "Another grid, computed from stored events: equal:6x5, markings:6");

    TargetVerbs targetVerbs(app);
    StatusVerbs statusVerbs(app);
    DrillVerbs drillVerbs(app);
    FocusVerbs focusVerbs(app);
    PlanVerbs planVerbs(app);
    ExportVerbs exportVerbs(app);
    MomentVerbs momentVerbs(app); // after ExportVerbs: it adds `export clips`
    CompareVerbs compareVerbs(app);
    SquadVerbs squadVerbs(app);

    auto* metrics = app.add_subcommand("metrics", "List, show and add metric definitions");
    metrics->require_subcommand(1);
    auto* metricsList = metrics->add_subcommand("list", "List metrics");
    auto* metricsShow = metrics->add_subcommand("show", "Print one metric's spec as JSON");
    std::string showId;
    metricsShow->add_option("id", showId)->required();
    auto* metricsAdd = metrics->add_subcommand("add", "Add metrics from a JSON spec file");
    std::string addFile;
    bool addReplace = false;
    metricsAdd->add_option("file", addFile)->required();
    metricsAdd->add_flag("--replace", addReplace, "Redefine an existing user metric");
    auto* metricsRemove = metrics->add_subcommand("remove", "Remove a user metric");
    std::string removeId;
    metricsRemove->add_option("id", removeId)->required();

    auto* backup = app.add_subcommand("backup", "Copy the club file while it is in use");
    std::string backupTarget;
    backup->add_option("target", backupTarget, "File to write")->required();

    try {
        app.parse(argc, argv);
    } catch (const CLI::Success& e) {
        return app.exit(e, out, err);
    } catch (const CLI::ParseError& e) {
        app.exit(e, out, err);
        return kExitBadInput;
    }

    try {
        if (*ingest) {
            for (const auto& map : typeMaps) {
                const auto eq = map.find('=');
                auto type = eq == std::string::npos
                                ? std::nullopt
                                : eventTypeFromString(std::string_view(map).substr(eq + 1));
                if (!type) {
                    err << "error: --map-type " << map << ": expected NAME=TYPE with one of our "
                        << "types after '='\n";
                    return kExitBadInput;
                }
                ingestOptions.read.typeMap[map.substr(0, eq)] = *type;
            }
            std::optional<MappingProfile> profile;
            if (!profilePath.empty()) {
                profile = profileByPathOrName(g, profilePath, err);
                if (!profile) return kExitBadInput;
            }
            return cmdIngest(g, files, ingestOptions, profile, ingestDetails.details(), err);
        }
        if (*profileCheck) return cmdProfileCheck(checkProfile, checkFile, checkDetails.details(), out, err);
        if (*profileSave) {
            auto repo = openClub(g);
            std::string text;
            try {
                text = readFileBytes(saveFile);
            } catch (const IoError& e) {
                err << "error: " << saveFile << ": " << e.what() << "\n";
                return kExitBadInput;
            }
            const Problems problems = ProfileStore(*repo).save(saveName, text, saveBy, nowUtcIso());
            for (Problem p : problems) {
                p.file = saveFile;
                err << "error: " << p.describe() << "\n";
            }
            if (!problems.empty()) return kExitBadInput;
            err << "saved profile '" << saveName << "'\n";
            return kExitOk;
        }
        if (*profileList) {
            auto repo = openClub(g);
            for (const auto& p : ProfileStore(*repo).list()) {
                const auto parsed = parseProfile(p.text, p.name);
                out << p.name << "\t" << (parsed.profile ? parsed.profile->name : std::string("(unreadable)"))
                    << "\t" << p.savedBy << "\t" << p.savedAt << "\n";
            }
            return kExitOk;
        }
        if (*profileRemove) {
            auto repo = openClub(g);
            if (!ProfileStore(*repo).remove(removeProfile)) {
                err << "error: no saved profile '" << removeProfile << "'\n";
                return kExitBadInput;
            }
            err << "removed profile '" << removeProfile << "'\n";
            return kExitOk;
        }
        if (*matches) return cmdMatches(g, matchesFormat, out);
        if (*tallies) return cmdTallies(g, talliesFormat, talliesMatch, talliesMetric, talliesGrid, out, err);
        if (targetVerbs.chosen()) return targetVerbs.run(g, out, err);
        if (statusVerbs.chosen()) return statusVerbs.run(g, out, err);
        if (drillVerbs.chosen()) return drillVerbs.run(g, out, err);
        if (focusVerbs.chosen()) return focusVerbs.run(g, out, err);
        if (planVerbs.chosen()) return planVerbs.run(g, out, err);
        if (momentVerbs.chosen()) return momentVerbs.run(g, out, err);
        if (compareVerbs.chosen()) return compareVerbs.run(g, out, err);
        if (squadVerbs.chosen()) return squadVerbs.run(g, out, err);
        if (exportVerbs.chosen()) return exportVerbs.run(g, out, err);
        if (*metricsList) return cmdMetricsList(g, out);
        if (*metricsShow) return cmdMetricsShow(g, showId, out, err);
        if (*metricsAdd) return cmdMetricsAdd(g, addFile, addReplace, err);
        if (*metricsRemove) {
            auto repo = openClub(g);
            for (const auto& b : builtinMetrics())
                if (b.id == removeId) {
                    err << "error: '" << removeId << "' is a built-in metric and stays\n";
                    return kExitBadInput;
                }
            if (!repo->removeMetric(removeId)) {
                err << "error: no metric '" << removeId << "'\n";
                return kExitBadInput;
            }
            err << "removed metric " << removeId << " and its tallies\n";
            return kExitOk;
        }
        if (*backup) {
            openClub(g)->backupTo(backupTarget);
            err << "backed up " << g.db << " to " << backupTarget << "\n";
            return kExitOk;
        }
    } catch (const StorageError& e) {
        err << "error: " << e.what() << "\n";
        return kExitFault;
    } catch (const std::exception& e) {
        err << "error: " << e.what() << "\n";
        return kExitFault;
    }
    return kExitOk;
}

} // namespace pitchloop::cli
