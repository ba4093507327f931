#pragma once
// The plumbing around a printed PDF: a GUI application for the font database when the caller
// has none, the sheets' font, and a PDF file written beside its final name and moved in place
// only when complete.

#include <QFont>
#include <QPdfWriter>
#include <QSaveFile>
#include <memory>
#include <string>

class QGuiApplication;

namespace pitchloop::print {

/// Keeps a QGuiApplication alive for one export: the caller's own when it has one, else an
/// offscreen one made here and destroyed at the end of the scope.
class GuiScope {
  public:
    GuiScope();
    ~GuiScope();
    GuiScope(const GuiScope&) = delete;
    GuiScope& operator=(const GuiScope&) = delete;

    /// False when the process runs a non-GUI QCoreApplication: fonts cannot be used then, and
    /// a second application cannot be made.
    bool ok() const;

  private:
    std::unique_ptr<QGuiApplication> m_app;
};

/// Millimetres on the page in device units of a writer (its resolution set before use).
class Mm {
  public:
    explicit Mm(const QPdfWriter& w) : m_perMm(w.resolution() / 25.4) {}
    double operator()(double mm) const { return mm * m_perMm; }

  private:
    double m_perMm;
};

/// Model text (UTF-8) as a QString.
inline QString q(const std::string& s) { return QString::fromStdString(s); }

/// The family every sheet is set in (Debian's fonts-dejavu-core), loaded from its file when
/// the font database does not list it.
QString sheetFamily();
QFont sheetFont(double pointSize, bool bold = false);

/// A PDF written to a temporary file in the target's folder; commit() renames it over the
/// target. Without a commit (an error, an exception) the temporary file is removed and the
/// target is left as it was.
class PdfFile {
  public:
    explicit PdfFile(const std::string& path);
    ~PdfFile();

    /// Creates the temporary file; false with `problem` set when the folder is missing or not
    /// writable, or the path names a folder.
    bool open(std::string& problem);
    QPdfWriter& writer() { return *m_writer; }
    /// Finishes the file and moves it in place; false with `problem` set on a write fault.
    bool commit(std::string& problem);

  private:
    std::string m_path;
    QSaveFile m_file;
    std::unique_ptr<QPdfWriter> m_writer;
};

} // namespace pitchloop::print
