#include "startup.h"

#include <QDir>
#include <QFileInfo>
#include <QSettings>
#include <QStandardPaths>

namespace pitchloop::desktop {

QString explicitClubFile(const QString& dbOption) {
    if (!dbOption.isEmpty()) return dbOption;
    return qEnvironmentVariable("PITCHLOOP_DB");
}

QString userClubFile() {
    const QString base = QStandardPaths::writableLocation(QStandardPaths::GenericDataLocation);
    return QDir(base).filePath(QStringLiteral("pitchloop/club.sqlite"));
}

namespace {
const QString kRememberedKey = QStringLiteral("club/lastFile");
}

ClubChoice chooseClubFile(const QString& explicitFile, const QString& userFile,
                          const QStringList& demoCandidates, const QString& rememberedFile) {
    if (!explicitFile.isEmpty()) return {explicitFile, false};
    if (!rememberedFile.isEmpty() && QFileInfo(rememberedFile).isFile()) return {rememberedFile, false};
    if (QFileInfo::exists(userFile)) return {userFile, false};
    for (const QString& demo : demoCandidates)
        if (QFileInfo(demo).isFile()) return {QFileInfo(demo).absoluteFilePath(), true};
    return {userFile, false};
}

QString rememberedClubFile() { return QSettings().value(kRememberedKey).toString(); }

void rememberClubFile(const QString& file) {
    QSettings().setValue(kRememberedKey, QFileInfo(file).absoluteFilePath());
}

} // namespace pitchloop::desktop
