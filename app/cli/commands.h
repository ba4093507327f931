#pragma once
// The command line's verbs, callable in-process so tests can run them.

#include <ostream>

namespace pitchloop::cli {

/// Exit codes: 0 done, 1 a fault (storage, I/O), 2 bad input or bad usage.
inline constexpr int kExitOk = 0;
inline constexpr int kExitFault = 1;
inline constexpr int kExitBadInput = 2;

int run(int argc, char** argv, std::ostream& out, std::ostream& err);

} // namespace pitchloop::cli
