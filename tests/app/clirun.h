#pragma once
// Runs the command line in-process for the CLI tests: arguments in, exit code and both
// streams out.

#include "commands.h"
#include "testutil.h" // contains

#include <sstream>
#include <string>
#include <vector>

namespace pitchloop::testutil {

struct CliRun {
    int code = -1;
    std::string out;
    std::string err;
};

/// `pitchloop ARGS...` through pitchloop::cli::run.
inline CliRun cli(std::vector<std::string> args) {
    args.insert(args.begin(), "pitchloop");
    std::vector<char*> argv;
    for (auto& a : args) argv.push_back(a.data());
    argv.push_back(nullptr);
    std::ostringstream out, err;
    CliRun r;
    r.code = pitchloop::cli::run(static_cast<int>(args.size()), argv.data(), out, err);
    r.out = out.str();
    r.err = err.str();
    return r;
}

} // namespace pitchloop::testutil
