#include "ingest.h"

namespace pitchloop::model {

namespace {

/// Stores what the reader made of a file, or says why not; `bytes` are hashed to recognise the
/// same file again.
IngestReport ingestRead(ClubRepository& repo, ReadResult read, std::string_view bytes,
                        const std::string& fileName, const IngestOptions& options) {
    IngestReport report;
    report.file = fileName;
    report.warnings = std::move(read.warnings);
    if (!read.ok()) {
        report.errors = std::move(read.errors);
        report.status = IngestStatus::Invalid;
        return report;
    }
    const Match& match = *read.match;
    report.matchId = match.info.id;
    report.events = static_cast<int>(match.events.size());

    const std::string hash = contentHash(bytes);
    const auto stored = repo.sourceOf(match.info.id);
    if (stored && stored->hash == hash) {
        report.status = IngestStatus::Unchanged;
        return report;
    }
    if (stored && !options.replace) {
        std::string from = stored->name.empty() ? "" : " from " + stored->name;
        if (!stored->ingestedAt.empty()) from += " on " + stored->ingestedAt.substr(0, 10);
        report.errors.push_back({fileName, "match", "id",
                                 "match '" + match.info.id + "' is already in the club file" +
                                     from + " with different content, so it was not replaced"});
        report.status = IngestStatus::Refused;
        return report;
    }
    if (const std::string note = zoneOnlyNote(match.info, repo.tallyGrid()); !note.empty())
        report.warnings.push_back({fileName, "match", "zone_only",
                                   note + ": the club's zone tallies leave this match out"});
    const std::string club = repo.clubName();
    if (!club.empty() && club != match.info.us)
        report.warnings.push_back({fileName, "match", "us",
                                   "'" + match.info.us + "' is not this club file's club '" +
                                       club + "'; stored in squad '" + options.squad + "'"});
    repo.storeMatch(match, {fileName, hash, {}}, options.squad, stored.has_value());
    report.status = stored ? IngestStatus::Replaced : IngestStatus::Added;
    return report;
}

} // namespace

IngestReport ingestBytes(ClubRepository& repo, std::string_view bytes,
                         const std::string& fileName, const IngestOptions& options) {
    return ingestRead(repo, parseMatch(bytes, fileName, options.read), bytes, fileName, options);
}

IngestReport ingestFile(ClubRepository& repo, const std::filesystem::path& file,
                        const IngestOptions& options) {
    std::string bytes;
    try {
        bytes = readFileBytes(file);
    } catch (const IoError&) {
        IngestReport report;
        report.file = file.string();
        std::error_code ec;
        report.errors.push_back({file.string(), "", "",
                                 std::filesystem::exists(file, ec) ? "cannot be read"
                                                                   : "no such file"});
        return report;
    }
    return ingestBytes(repo, bytes, file.string(), options);
}

std::string_view toString(IngestStatus s) {
    switch (s) {
    case IngestStatus::Added: return "added";
    case IngestStatus::Replaced: return "replaced";
    case IngestStatus::Unchanged: return "unchanged";
    case IngestStatus::Invalid: return "invalid";
    case IngestStatus::Refused: return "refused";
    }
    return "?";
}

std::vector<IngestReport> ingestTableFile(ClubRepository& repo, const std::filesystem::path& file,
                                          const MappingProfile& profile, const MatchDetails& details,
                                          const IngestOptions& options) {
    std::string bytes;
    try {
        bytes = readFileBytes(file);
    } catch (const IoError& e) {
        IngestReport report;
        report.file = file.string();
        report.errors.push_back({file.string(), "", "", e.what()});
        return {report};
    }
    std::vector<IngestReport> reports;
    for (const MappedTable& mapped : mapFileMatches(bytes, profile, details, file.string())) {
        IngestReport report;
        report.file = file.string();
        report.warnings = mapped.warnings;
        if (!mapped.errors.empty()) {
            report.errors = mapped.errors;
            report.status = IngestStatus::Invalid;
            if (mapped.match.contains("match")) report.matchId = mapped.match["match"].value("id", "");
            reports.push_back(std::move(report));
            continue;
        }
        // What is stored is identified by the mapped match, not the table's bytes: the same
        // table read with a changed profile is a changed match.
        IngestReport stored = ingestRead(repo, parseMatchDocument(mapped.match, file.string(), options.read),
                                         mapped.match.dump(), file.string(), options);
        stored.errors = inTableTerms(stored.errors, mapped, profile);
        Problems warnings = inTableTerms(stored.warnings, mapped, profile);
        stored.warnings = report.warnings;
        stored.warnings.insert(stored.warnings.end(), warnings.begin(), warnings.end());
        reports.push_back(std::move(stored));
    }
    return reports;
}

} // namespace pitchloop::model
