#pragma once
// The whole command line as a function, so tests can run it in-process.
#include <iosfwd>

namespace atollog::cli {

/// Exit codes: 0 fine, 1 findings (check found problems), 2 bad input or usage.
enum ExitCode : int { kOk = 0, kFindings = 1, kBadInput = 2 };

int runCli(int argc, const char* const* argv, std::ostream& out, std::ostream& err);

} // namespace atollog::cli
