#pragma once
// Ingest: one match file in, validated, stored with its tallies in one transaction.

#include "importprofile.h"
#include "matchreader.h"
#include "problem.h"
#include "repository.h"

#include <filesystem>
#include <string>

namespace pitchloop::model {

struct IngestOptions {
    bool replace = false;            ///< replace a stored match with the same id
    std::string squad = "First team";
    ReadOptions read;
};

enum class IngestStatus {
    Added,     ///< new match stored
    Replaced,  ///< stored match of the same id replaced (only with `replace`)
    Unchanged, ///< the very same file was ingested before: nothing to do
    Invalid,   ///< the file has errors; nothing stored
    Refused,   ///< a different file for a match id already stored, without `replace`
};

struct IngestReport {
    std::string file;
    std::string matchId;
    IngestStatus status = IngestStatus::Invalid;
    int events = 0;
    Problems errors;
    Problems warnings;
    bool ok() const { return status != IngestStatus::Invalid && status != IngestStatus::Refused; }
};

/// Reads, validates and stores one match file. Bad input comes back as errors in the report
/// and leaves the club file untouched; storage faults throw StorageError (also untouched: the
/// transaction rolls back).
IngestReport ingestFile(ClubRepository& repo, const std::filesystem::path& file,
                        const IngestOptions& options = {});

/// The same from bytes already in memory; `fileName` names them in problems.
IngestReport ingestBytes(ClubRepository& repo, std::string_view bytes,
                         const std::string& fileName, const IngestOptions& options = {});

/// Reads a table (CSV, TSV, JSON Lines...) with a mapping profile (importprofile.h) and ingests
/// the match it holds like a native file: the same checks, one transaction, nothing stored on
/// any error. Problems name the table's file, line and column; unmapped words are errors.
/// A table may hold several matches (the profile's match columns): one report each, each match
/// in its own transaction.
std::vector<IngestReport> ingestTableFile(ClubRepository& repo, const std::filesystem::path& file,
                                          const MappingProfile& profile, const MatchDetails& details,
                                          const IngestOptions& options = {});

std::string_view toString(IngestStatus s);

} // namespace pitchloop::model
