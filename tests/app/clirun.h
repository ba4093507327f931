#pragma once
// Runs the command line in-process for the CLI tests: arguments in, exit code and both
// streams out.

#include "commands.h"
#include "testutil.h" // contains

#include <cstdio>
#include <sstream>
#include <stdexcept>
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

/// A fresh club file in its own temporary folder `name` holding the demo's matches 1 to `matches`
/// (sample-club/matches, ingested by the command line); its path. Throws when the ingest fails.
inline std::string demoClub(const std::string& name, int matches) {
    const std::string db = (freshTempDir(name) / "club.sqlite").string();
    std::vector<std::string> args{"--db", db, "ingest"};
    for (int i = 1; i <= matches; ++i) {
        char file[48];
        std::snprintf(file, sizeof file, "sample-club/matches/KB-2026-%02d.json", i);
        args.push_back(sourcePath(file).string());
    }
    if (const CliRun r = cli(args); r.code != 0) throw std::runtime_error("demo ingest failed: " + r.err);
    return db;
}

} // namespace pitchloop::testutil
