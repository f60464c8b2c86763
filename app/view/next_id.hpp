#pragma once
// Ids for rows the desk adds (a run, a sample, an event copy): the last id with its trailing
// number counted up, keeping its width ("KAL1-R11" -> "KAL1-R12", "KAL1-019" -> "KAL1-020"),
// or "<last>-2" when it ends in no number; counted on until no stored id is equal.
#include <string>
#include <vector>

namespace atollog::view {

std::string nextId(const std::string &last, const std::vector<std::string> &taken);

} // namespace atollog::view
