#pragma once
// Checks of a whole dataset against the rules of the core data folder contract.
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/data_issue.hpp"

#include <vector>

namespace atollog {

/// Every problem in the dataset with its severity, in table order then row order.
/// Never throws for bad data: bad data is what it reports.
std::vector<DataIssue> validateDataset(const CoreDataset& data);

} // namespace atollog
