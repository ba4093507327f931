#pragma once
// Drawing the sheets' data (sheetdata.h) onto a PDF writer, one function a sheet.

#include "sheetdata.h"

class QPdfWriter;

namespace pitchloop::print {

/// What a drawing did, for tests and messages.
struct DrawReport {
    bool ok = false; ///< false: the painter could not start on the writer
    int pages = 0;
    double fontScale = 1;  ///< the session sheet's drill text, shrunk a little to fit one page
    int elidedTexts = 0;   ///< texts cut short with "…" to fit
    int blocksLeftOut = 0; ///< blocks with no room at all (listed on the sheet as missing)
};

/// The session sheet: A4 portrait, one page when the drill texts fit it; otherwise the blocks
/// run onto further pages and no text is cut (only a block longer than a whole page is).
DrawReport drawSessionSheet(const SessionSheetData& data, QPdfWriter& writer);

/// The match debrief: A4 landscape, as many pages as the slipped targets need.
DrawReport drawDebriefSheet(const DebriefSheetData& data, QPdfWriter& writer);

} // namespace pitchloop::print
