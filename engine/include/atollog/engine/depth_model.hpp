#pragma once
// Where a logged depth sits in a hole's core runs, and which true depths it may stand for.
// Recovered core is logged from the top of its run, so a piece logged at depth d in a run with
// unrecovered length u may really come from anywhere in [d, d + u] (clipped to the run's base).
#include "atollog/engine/core_records.hpp"

#include <cstddef>
#include <optional>
#include <vector>

namespace atollog {

enum class DepthPart {
    Recovered,   ///< inside a run, within its recovered length measured from the run top
    Unrecovered, ///< inside a run, below its recovered length
    Uncored      ///< not inside any run (between runs, above the first, below the last)
};

struct DepthLocation {
    DepthPart part = DepthPart::Uncored;
    std::optional<std::size_t> run_index; ///< index into DepthModel::runs() when inside a run
};

struct DepthRange {
    double shallow_m = 0;
    double deep_m = 0;
    double width_m() const { return deep_m - shallow_m; }
};

class DepthModel {
  public:
    /// Runs of one hole in any order; they are sorted by top. Throws std::invalid_argument on
    /// non-finite depths, base not below top, negative recovery or overlapping runs.
    explicit DepthModel(std::vector<CoreRun> runs);

    const std::vector<CoreRun>& runs() const { return runs_; }
    /// Runs are closed [top, base]; a depth on the boundary of two touching runs belongs to the
    /// run that starts there. Throws std::invalid_argument on a non-finite depth.
    DepthLocation locate(double depth_m) const;
    /// The true depths a logged depth may stand for. Outside any run, the point itself; in the
    /// unrecovered part of a run, the depth down to the run base. Throws as locate does.
    DepthRange trueDepthRange(double depth_m) const;
    double cored_m() const;
    double recovered_m() const; ///< recovered length counted up to each run's cored length
    double recovery_fraction() const; ///< recovered / cored; 0 when nothing was cored

  private:
    std::vector<CoreRun> runs_;
};

} // namespace atollog
