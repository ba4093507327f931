#include "pdfdocument.h"

#include <QDir>
#include <QFileInfo>
#include <QFontDatabase>
#include <QGuiApplication>
#include <cstdlib>
#include <filesystem>
#include <string>
#include <sys/stat.h>
#include <unistd.h>

namespace pitchloop::print {

namespace {

/// Qt keeps references to argc and argv for the application's whole life, so they are static;
/// it also removes the options it reads from them, so each new application sets them again.
int g_argc = 0;
char g_arg0[] = "pitchloop";
char g_arg1[] = "-platform";
char g_arg2[] = "offscreen";
char* g_argv[] = {nullptr, nullptr, nullptr, nullptr};

/// Qt warns when XDG_RUNTIME_DIR is unset; give it a private (0700) folder of our own: one a
/// user, reused by later runs when it is still ours and private, else a fresh one.
void ensureRuntimeDir() {
    if (std::getenv("XDG_RUNTIME_DIR")) return;
    const auto temp = std::filesystem::temp_directory_path();
    const std::string mine = (temp / ("pitchloop-runtime-" + std::to_string(::getuid()))).string();
    ::mkdir(mine.c_str(), 0700);
    struct stat st {};
    if (::lstat(mine.c_str(), &st) == 0 && S_ISDIR(st.st_mode) && st.st_uid == ::getuid() &&
        (st.st_mode & 0777) == 0700) {
        ::setenv("XDG_RUNTIME_DIR", mine.c_str(), 0);
        return;
    }
    std::string pattern = (temp / "pitchloop-runtime-XXXXXX").string();
    if (::mkdtemp(pattern.data())) ::setenv("XDG_RUNTIME_DIR", pattern.c_str(), 0);
}

constexpr const char* kFamily = "DejaVu Sans";

} // namespace

GuiScope::GuiScope() {
    if (QGuiApplication::instance()) return;
    ensureRuntimeDir();
    g_argc = 3;
    g_argv[0] = g_arg0;
    g_argv[1] = g_arg1;
    g_argv[2] = g_arg2;
    g_argv[3] = nullptr;
    m_app = std::make_unique<QGuiApplication>(g_argc, g_argv);
}

GuiScope::~GuiScope() = default;

bool GuiScope::ok() const {
    return qobject_cast<QGuiApplication*>(QCoreApplication::instance()) != nullptr;
}

QString sheetFamily() {
    static bool checked = false;
    if (!checked) {
        checked = true;
        if (!QFontDatabase::families().contains(QLatin1String(kFamily))) {
            for (const char* file : {"/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf",
                                     "/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf"})
                QFontDatabase::addApplicationFont(QString::fromLatin1(file));
        }
    }
    return QString::fromLatin1(kFamily);
}

QFont sheetFont(double pointSize, bool bold) {
    QFont f(sheetFamily());
    f.setStyleHint(QFont::SansSerif);
    f.setPointSizeF(pointSize);
    f.setBold(bold);
    // No ligatures: "fi" stays two letters, so the PDF's text reads back and searches as typed.
    f.setStyleStrategy(QFont::PreferNoShaping);
    return f;
}

PdfFile::PdfFile(const std::string& path) : m_path(path), m_file(QString::fromStdString(path)) {}

PdfFile::~PdfFile() {
    m_writer.reset();
    if (m_file.isOpen()) m_file.cancelWriting(); // QSaveFile then removes the temporary file
}

bool PdfFile::open(std::string& problem) {
    const QFileInfo info(QString::fromStdString(m_path));
    if (m_path.empty()) {
        problem = "no file name given for the PDF";
        return false;
    }
    if (info.isDir()) {
        problem = m_path + ": is a folder, not a file name";
        return false;
    }
    if (!info.absoluteDir().exists()) {
        problem = m_path + ": cannot be written: the folder " + info.absolutePath().toStdString() +
                  " does not exist";
        return false;
    }
    if (!m_file.open(QIODevice::WriteOnly)) {
        problem = m_path + ": cannot be written (" + m_file.errorString().toStdString() + ")";
        return false;
    }
    m_writer = std::make_unique<QPdfWriter>(&m_file);
    m_writer->setCreator(QStringLiteral("Pitchloop"));
    return true;
}

bool PdfFile::commit(std::string& problem) {
    m_writer.reset(); // flushes nothing more: the painter has ended and written the file
    if (m_file.error() != QFileDevice::NoError) {
        problem = m_path + ": writing failed (" + m_file.errorString().toStdString() + ")";
        m_file.cancelWriting();
        return false;
    }
    if (!m_file.commit()) {
        problem = m_path + ": could not be finished (" + m_file.errorString().toStdString() + ")";
        return false;
    }
    return true;
}

} // namespace pitchloop::print
