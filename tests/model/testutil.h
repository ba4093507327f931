#pragma once
// Helpers shared by the tests: hand-made matches and a data snapshot of a club file.

#include "types.h"

#include <filesystem>
#include <string>
#include <vector>

namespace pitchloop::testutil {

/// A two-period match on a 105 × 68 m pitch (periods of 2700 s) with the given events, which
/// get file indices in order. Coordinates are already in our frame.
model::Match makeMatch(std::vector<model::Event> events, double periodLengthS = 2700);

/// A shorthand event: side, type, result, time in period 1, place in our frame.
model::Event ev(model::Side side, model::EventType type, model::Result result, double t, double x,
                double y, int period = 1);

/// Every row of every table of an SQLite file, as text in a stable order: compares the data
/// of two states of a club file regardless of page layout or WAL state.
std::string dataSnapshot(const std::string& sqliteFile);

/// A fresh empty directory under the system temp folder.
std::filesystem::path freshTempDir(const std::string& name);

/// Whether `part` occurs in `text` (for checking messages).
inline bool contains(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

/// Absolute path of a file in the source tree.
std::filesystem::path sourcePath(const std::string& relative);

} // namespace pitchloop::testutil
