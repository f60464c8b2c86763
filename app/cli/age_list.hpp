#pragma once
// A list of ages in Ma typed on the command line ("0.125,0.4"), for isochrons.
#include <string>
#include <vector>

namespace atollog::cli {

/// Throws std::invalid_argument naming the option and the item that is not an age >= 0.
std::vector<double> parseAgeList(const std::string& text, const std::string& option);

} // namespace atollog::cli
