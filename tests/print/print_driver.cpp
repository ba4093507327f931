// Writes the printed sheets of a club file, for the outside check (tests/print/check_pdfs.py):
//   print_driver [--own-app] CLUB sheet SQUAD DATE OUT.pdf
//   print_driver [--own-app] CLUB debrief MATCH OUT.pdf
// With --own-app the driver makes its own QGuiApplication first (as the desktop app would).

#include "printing.h"
#include "repository.h"

#include <QGuiApplication>
#include <iostream>
#include <memory>
#include <string>
#include <vector>

int main(int argc, char** argv) {
    std::vector<std::string> args(argv + 1, argv + argc);
    std::unique_ptr<QGuiApplication> app;
    static int appArgc = 3;
    static char a0[] = "print_driver", a1[] = "-platform", a2[] = "offscreen";
    static char* appArgv[] = {a0, a1, a2, nullptr};
    if (!args.empty() && args.front() == "--own-app") {
        app = std::make_unique<QGuiApplication>(appArgc, appArgv);
        args.erase(args.begin());
    }
    const bool sheet = args.size() == 5 && args[1] == "sheet";
    const bool debrief = args.size() == 4 && args[1] == "debrief";
    if (!sheet && !debrief) {
        std::cerr << "usage: print_driver [--own-app] CLUB sheet SQUAD DATE OUT.pdf\n"
                     "       print_driver [--own-app] CLUB debrief MATCH OUT.pdf\n";
        return 2;
    }
    pitchloop::model::ClubRepository repo(args[0]);
    return sheet ? pitchloop::print::exportSessionSheet(repo, args[2], args[3], args[4], std::cerr)
                 : pitchloop::print::exportDebrief(repo, args[2], args[3], std::cerr);
}
