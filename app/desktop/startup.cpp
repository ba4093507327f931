#include "startup.h"

#include <QDir>
#include <QFileInfo>
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

ClubChoice chooseClubFile(const QString& explicitFile, const QString& userFile,
                          const QStringList& demoCandidates) {
    if (!explicitFile.isEmpty()) return {explicitFile, false};
    if (QFileInfo::exists(userFile)) return {userFile, false};
    for (const QString& demo : demoCandidates)
        if (QFileInfo(demo).isFile()) return {QFileInfo(demo).absoluteFilePath(), true};
    return {userFile, false};
}

} // namespace pitchloop::desktop
