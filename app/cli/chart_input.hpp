#pragma once
// Turns a project's data and its biostratigraphy into the plain input of the range chart.
#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "draw/range_chart_input.hpp"

#include <string>
#include <vector>

namespace atollog::cli {

/// Marker size rank 0-5 of an abundance: the class words in order (present 0 ... dominant 5);
/// a whole count by our own bins (1: 1, 2-4: 2, 5-9: 3, 10-19: 4, 20 and more: 5), since counts
/// have no shared scale across groups; not given: 1.
int abundanceRank(const std::optional<Abundance>& abundance);

/// The range chart of one hole: its cored section, recovery track, examined samples, the taxa
/// with any occurrence there (or only `taxa` when not empty, in that order; an unknown one
/// throws std::invalid_argument), and its found picks with their widened and extended brackets.
/// Columns are ordered by lowest occurrence, deepest first, then by highest occurrence, so
/// ranges step up to the right.
draw::RangeChartInput rangeChartInputFor(const CoreDataset& data, const BiostratResult& result,
                                         const std::string& hole,
                                         const std::vector<std::string>& taxa, double scale_ratio);

} // namespace atollog::cli
