// The `pitchloop` command line: data on stdout, messages on stderr (docs/cli.md).
#include "commands.h"

#include <iostream>

int main(int argc, char** argv) {
    return pitchloop::cli::run(argc, argv, std::cout, std::cerr);
}
