#pragma once
// Which club file the app opens: --db, else the club file the user last opened in the app
// (while it still exists), else the user's club file, else (when the user has none yet) the
// demo club, else a new empty club file in the user's data folder.

#include <QString>
#include <QStringList>

namespace pitchloop::desktop {

struct ClubChoice {
    QString file;
    bool demo = false; ///< the demo club, opened because the user has no club file yet
};

/// The club file named outside the app: --db's value, else $PITCHLOOP_DB (as the command line
/// reads it); empty when neither is given.
QString explicitClubFile(const QString& dbOption);

/// The user's club file: pitchloop/club.sqlite in the generic data folder (QStandardPaths;
/// ~/.local/share on Linux), the command line's default too.
QString userClubFile();

/// `explicitFile` wins, existing or not; else `rememberedFile` when it exists; else `userFile`
/// when it exists; else the first existing demo candidate; else `userFile`, to be created.
ClubChoice chooseClubFile(const QString& explicitFile, const QString& userFile,
                          const QStringList& demoCandidates, const QString& rememberedFile = {});

/// The club file last opened with "Open another club file…" (QSettings), empty when none.
QString rememberedClubFile();
/// Remembers `file` (made absolute) as the club file to open next time.
void rememberClubFile(const QString& file);

} // namespace pitchloop::desktop
