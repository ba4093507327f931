#pragma once
// Problems found in user input: an expected outcome, returned as values (never thrown).

#include <stdexcept>
#include <string>
#include <vector>

namespace pitchloop::model {

/// One thing wrong (or worth a warning) in a file the user gave us.
struct Problem {
    std::string file;    ///< the file's name as the user gave it
    std::string place;   ///< e.g. "events[12]", "match.pitch", "line 4, column 17"
    std::string field;   ///< e.g. "x", "length_m"; empty when the place says it all
    std::string message; ///< plain words, no trailing full stop

    /// "file: place.field: message" — the one line a person reads.
    std::string describe() const;
};

using Problems = std::vector<Problem>;

/// Joins problems one per line.
std::string describeAll(const Problems& problems);

/// I/O faults: a file that cannot be opened or written.
class IoError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

/// Storage faults: the club file cannot be opened, migrated or written.
class StorageError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

} // namespace pitchloop::model
