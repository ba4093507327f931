#include "printing.h"

#include "pdfdocument.h"
#include "problem.h"
#include "sheetdata.h"
#include "sheets.h"

#include <exception>

namespace pitchloop::print {

namespace {

constexpr int kOk = 0, kFault = 1, kBadInput = 2;

/// Builds the data, then draws it into a PDF that replaces `pdfPath` only once complete.
template <class Data, class Build, class Draw>
int exportPdf(const std::string& pdfPath, const std::string& what, std::ostream& err, Build build,
              Draw draw) {
    try {
        const SheetResult<Data> built = build();
        if (!built.data) {
            err << "error: " << built.problem << "; " << pdfPath << " not written\n";
            return kBadInput;
        }
        const GuiScope gui;
        if (!gui.ok()) {
            err << "error: " << pdfPath << ": PDFs need a GUI application (QGuiApplication), "
                << "and this program runs a plain QCoreApplication; nothing written\n";
            return kFault;
        }
        PdfFile file(pdfPath);
        std::string problem;
        if (!file.open(problem)) {
            err << "error: " << problem << "\n";
            return kBadInput;
        }
        const DrawReport report = draw(*built.data, file.writer());
        if (!report.ok) {
            err << "error: " << pdfPath << ": the PDF could not be started; nothing written\n";
            return kFault;
        }
        if (!file.commit(problem)) {
            err << "error: " << problem << "\n";
            return kFault;
        }
        if (report.blocksLeftOut > 0)
            err << "warning: " << pdfPath << ": " << report.blocksLeftOut
                << " block(s) did not fit on the page; the sheet says so\n";
        err << "wrote " << what << " to " << pdfPath << " (" << report.pages
            << (report.pages == 1 ? " page" : " pages") << ")\n";
        return kOk;
    } catch (const model::StorageError& e) {
        err << "error: the club file could not be read: " << e.what() << "; " << pdfPath
            << " not written\n";
        return kFault;
    } catch (const std::exception& e) {
        err << "error: " << pdfPath << ": " << e.what() << "; nothing written\n";
        return kFault;
    }
}

} // namespace

int exportSessionSheet(model::ClubRepository& repo, const std::string& squad,
                       const std::string& date, const std::string& pdfPath, std::ostream& err) {
    return exportPdf<SessionSheetData>(
        pdfPath, "the session sheet of " + squad + " on " + date, err,
        [&] { return sessionSheetData(repo, squad, date); },
        [](const SessionSheetData& d, QPdfWriter& w) { return drawSessionSheet(d, w); });
}

int exportDebrief(model::ClubRepository& repo, const std::string& matchId,
                  const std::string& pdfPath, std::ostream& err) {
    return exportPdf<DebriefSheetData>(
        pdfPath, "the debrief of " + matchId, err, [&] { return debriefSheetData(repo, matchId); },
        [](const DebriefSheetData& d, QPdfWriter& w) { return drawDebriefSheet(d, w); });
}

} // namespace pitchloop::print
