#pragma once
// Mapping profiles saved in the club file under a name, and finding the one that reads a table:
// a table in a known layout then loads on drop, with no profile to pick (docs/import.md).

#include "importprofile.h"
#include "repository.h"

#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

struct SavedProfile {
    std::string name;
    std::string text; ///< the profile's JSON, as saved
    std::string savedBy;
    std::string savedAt;
};

/// The import_profile table of a club file.
class ProfileStore {
public:
    explicit ProfileStore(ClubRepository& repo) : m_repo(repo) {}

    /// Saves (or replaces) a profile under `name`; the text must read as a profile (the
    /// problems come back, nothing is saved otherwise).
    Problems save(const std::string& name, const std::string& text, const std::string& by,
                  const std::string& now);
    std::vector<SavedProfile> list() const;
    std::optional<SavedProfile> get(const std::string& name) const;
    bool remove(const std::string& name);

private:
    ClubRepository& m_repo;
};

/// The saved profile that reads a table: every column it names (event fields and match
/// columns) is in the table's header, in its layout and encoding; when several fit, the one
/// naming the most columns, then the first by name. nullopt when none fits.
std::optional<SavedProfile> profileFor(std::string_view bytes, const std::vector<SavedProfile>& saved);

/// Whether a file is a table for a profile rather than one of our match files: by its name
/// (.csv, .tsv, .txt, .jsonl, .ndjson).
bool looksLikeTable(const std::string& fileName);

} // namespace pitchloop::model
