#pragma once
// Printable PDFs of a saved session and a match debrief (docs/planner.md, docs/statistics.md),
// drawn with QPdfWriter and QPainter. This header names no Qt type: the command line includes
// it and links pitchloop_print.

#include "repository.h"

#include <ostream>
#include <string>

namespace pitchloop::print {

/// Writes the one-page session sheet of the squad's saved session on `date` to `pdfPath`.
/// Returns 0 (written), 1 (storage/write fault), 2 (bad input: no saved session that date,
/// unwritable path...). Messages in plain words go to `err`, naming the file/date. Never leaves
/// a half-written file (write to a temp name beside it, then rename).
int exportSessionSheet(model::ClubRepository& repo, const std::string& squad,
                       const std::string& date, const std::string& pdfPath, std::ostream& err);

/// Writes the match debrief PDF of stored match `matchId` to `pdfPath` (same return codes).
int exportDebrief(model::ClubRepository& repo, const std::string& matchId,
                  const std::string& pdfPath, std::ostream& err);

} // namespace pitchloop::print
