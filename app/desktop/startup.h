#pragma once
// Which club file the app opens: --db, else the user's club file, else (when the user has none
// yet) the demo club, else a new empty club file in the user's data folder.

#include <QString>
#include <QStringList>

namespace pitchloop::desktop {

struct ClubChoice {
    QString file;
    bool demo = false; ///< the demo club, opened because the user has no club file yet
};

/// The user's club file: $PITCHLOOP_DB when set, else pitchloop/club.sqlite in the generic data
/// folder (QStandardPaths; ~/.local/share on Linux), the same file the command line uses.
QString userClubFile();

/// `explicitFile` (from --db) wins; else `userFile` when it exists; else the first existing
/// demo candidate; else `userFile`, to be created.
ClubChoice chooseClubFile(const QString& explicitFile, const QString& userFile,
                          const QStringList& demoCandidates);

} // namespace pitchloop::desktop
