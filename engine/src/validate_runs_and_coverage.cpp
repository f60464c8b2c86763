// Depths and runs: base below top, no negative depths, recovery, runs and intervals of one hole
// not overlapping, and intervals, samples and dated depths inside the cored part of their hole.
// Recovered core is placed at the top of its run (ocean-drilling convention), which decides what
// "the unrecovered part of a run" is; DepthModel holds that rule.
#include "atollog/engine/depth_model.hpp"
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/validation_detail.hpp"

#include <algorithm>
#include <cmath>
#include <memory>

namespace atollog::detail {
namespace {

// Slack for depths that are equal on paper but differ by rounding (10.0 + 1.8 vs 11.8): far
// below any logged resolution.
constexpr double kRoundingSlack_m = 1e-6;

std::string span(double top_m, double base_m) {
    return derivedNumberText(top_m) + "-" + derivedNumberText(base_m) + " m";
}

/// Returns false after reporting a negative depth; such a depth is not checked against the runs
/// as well (one problem, one message).
bool requireNotNegative(IssueList &out, Table table, std::size_t row, const char *column,
                        double depth_m, const std::string &subject) {
    if (!std::isfinite(depth_m) || depth_m >= 0.0)
        return true;
    out.error(table, row, column, numberText(depth_m),
              subject + ": " + column + " " + numberText(depth_m) +
                  " is negative (above the collar)",
              "depths are metres below the collar, positive down; correct the sign or the datum");
    return false;
}

/// base_m must be deeper than top_m (or, when equal_ok, not shallower). Returns true when the
/// pair is usable as a depth span.
bool requireBaseBelowTop(IssueList &out, Table table, std::size_t row, double top_m, double base_m,
                         bool equal_ok, const std::string &subject) {
    if (!std::isfinite(top_m) || !std::isfinite(base_m))
        return false;
    if (base_m > top_m || (equal_ok && base_m == top_m))
        return true;
    const std::string problem =
        base_m == top_m ? "base_m " + numberText(base_m) + " equals top_m " + numberText(top_m)
                        : "base_m " + numberText(base_m) + " is above top_m " + numberText(top_m);
    out.error(table, row, "base_m", numberText(base_m), subject + ": " + problem,
              equal_ok ? "base_m must not be shallower than top_m; swap them or correct the depth"
                       : "base_m must be deeper (larger) than top_m; swap them or correct the "
                         "depth");
    return false;
}

/// A hole's runs once they are known to be consistent: the model, and the stretches of
/// continuous coring (touching runs merged).
struct CoredPart {
    std::unique_ptr<DepthModel> model;
    std::vector<DepthRange> blocks;
};

struct HoleRuns {
    std::vector<std::size_t> rows; // rows of runs.csv with this hole id
    bool consistent = true;        // every run usable and none overlapping
    CoredPart cored;
};

std::vector<DepthRange> continuousBlocks(const std::vector<CoreRun> &sorted_runs) {
    std::vector<DepthRange> blocks;
    for (const CoreRun &r : sorted_runs) {
        if (!blocks.empty() && r.top_m <= blocks.back().deep_m)
            blocks.back().deep_m = std::max(blocks.back().deep_m, r.base_m);
        else
            blocks.push_back({r.top_m, r.base_m});
    }
    return blocks;
}

enum class Coverage { Inside, Partly, Outside };

/// "Inside the cored part" means inside one stretch of continuous coring: an interval may span
/// the boundary of two touching runs, but not a gap between runs. Closed at both ends, so a
/// sample at the base of the last run is inside.

Coverage coverageOf(const std::vector<DepthRange> &blocks, double top_m, double base_m) {
    auto after = std::upper_bound(blocks.begin(), blocks.end(), top_m,
                                  [](double d, const DepthRange &b) { return d < b.shallow_m; });
    if (after != blocks.begin()) {
        const DepthRange &b = *std::prev(after);
        if (top_m >= b.shallow_m && base_m <= b.deep_m)
            return Coverage::Inside;
        if (top_m <= b.deep_m)
            return Coverage::Partly;
    }
    if (after != blocks.end() && after->shallow_m <= base_m)
        return Coverage::Partly;
    return Coverage::Outside;
}

void reportCoverage(IssueList &out, Table table, std::size_t row, const char *column,
                    const std::string &value, const std::string &subject, const std::string &hole,
                    Coverage c) {
    if (c == Coverage::Inside)
        return;
    out.error(table, row, column, value,
              subject +
                  (c == Coverage::Outside ? " lies outside every run of hole "
                                          : " is only partly inside the runs of hole ") +
                  quoted(hole) + " (not in the cored part)",
              "correct the depth, or add the run that cored it to runs.csv");
}

/// Unrecovered length of a run: its recovered core fills the run from the top.
double recoveredBase_m(const CoreRun &r) {
    return r.top_m + std::min(r.recovered_m, r.cored_m());
}

std::string runText(const CoreRun &r) {
    return "run " + quoted(r.run) + " (" + span(r.top_m, r.base_m) + ", " +
           numberText(r.recovered_m) + " m recovered)";
}

void checkRuns(const CoreDataset &data, IssueList &out,
               std::unordered_map<std::string_view, HoleRuns> &by_hole) {
    for (std::size_t i = 0; i < data.runs.size(); ++i) {
        const CoreRun &r = data.runs[i];
        const std::string subject = "run " + quoted(r.run) + " of hole " + quoted(r.hole);
        HoleRuns &hole = by_hole[r.hole];
        hole.rows.push_back(i);
        requireNotNegative(out, Table::Runs, i, "top_m", r.top_m, subject);
        const bool span_ok =
            requireBaseBelowTop(out, Table::Runs, i, r.top_m, r.base_m, false, subject);
        if (!std::isfinite(r.recovered_m)) {
            hole.consistent = false;
        } else if (r.recovered_m < 0.0) {
            hole.consistent = false;
            out.error(Table::Runs, i, "recovered_m", numberText(r.recovered_m),
                      subject + ": recovered_m " + numberText(r.recovered_m) + " is negative",
                      "give the recovered core length in metres, 0 when nothing came up");
        } else if (span_ok && r.recovered_m > r.cored_m()) {
            out.warning(Table::Runs, i, "recovered_m", numberText(r.recovered_m),
                        subject + ": recovered_m " + numberText(r.recovered_m) +
                            " is more than the cored length " + derivedNumberText(r.cored_m()) +
                            " m (" + numberText(std::round(100.0 * r.recovered_m / r.cored_m())) +
                            " % recovery)",
                        "over 100 % recovery happens when core expands; check the figure, "
                        "it is counted up to the cored length");
        }
        if (!span_ok)
            hole.consistent = false;
    }

    for (auto &[hole_id, hole] : by_hole) {
        std::vector<std::size_t> usable;
        for (std::size_t row : hole.rows)
            if (std::isfinite(data.runs[row].top_m) && std::isfinite(data.runs[row].base_m) &&
                data.runs[row].base_m > data.runs[row].top_m)
                usable.push_back(row);
        std::sort(usable.begin(), usable.end(), [&](std::size_t a, std::size_t b) {
            const CoreRun &ra = data.runs[a], &rb = data.runs[b];
            return ra.top_m != rb.top_m ? ra.top_m < rb.top_m : a < b;
        });
        // Compare each run with the deepest-reaching run above it, so that a long run
        // overlapping several later ones is caught for each of them.
        std::optional<std::size_t> deepest;
        for (std::size_t row : usable) {
            const CoreRun &r = data.runs[row];
            if (deepest && r.top_m < data.runs[*deepest].base_m) {
                hole.consistent = false;
                const CoreRun &other = data.runs[*deepest];
                out.error(
                    Table::Runs, row, "top_m", numberText(r.top_m),
                    "run " + quoted(r.run) + " (" + span(r.top_m, r.base_m) + ") overlaps run " +
                        quoted(other.run) + " (" + span(other.top_m, other.base_m) + ", data row " +
                        std::to_string(*deepest + 1) + ") of hole " + quoted(std::string(hole_id)),
                    "runs of one hole must not overlap; correct top_m or base_m of one "
                    "of them");
            }
            if (!deepest || r.base_m > data.runs[*deepest].base_m)
                deepest = row;
        }
        if (!hole.consistent)
            continue;
        std::vector<CoreRun> runs;
        runs.reserve(hole.rows.size());
        for (std::size_t row : hole.rows)
            runs.push_back(data.runs[row]);
        hole.cored.model = std::make_unique<DepthModel>(std::move(runs));
        hole.cored.blocks = continuousBlocks(hole.cored.model->runs());
    }
}

/// The cored part of a hole, or nullptr when there is nothing to check against (no runs, or runs
/// with errors of their own: those are reported, and coverage waits until they are fixed).
const CoredPart *coredPartOf(const std::unordered_map<std::string_view, HoleRuns> &by_hole,
                             std::string_view hole) {
    auto it = by_hole.find(hole);
    if (it == by_hole.end() || !it->second.consistent)
        return nullptr;
    return &it->second.cored;
}

void checkIntervals(const CoreDataset &data, IssueList &out,
                    const std::unordered_map<std::string_view, HoleRuns> &by_hole) {
    std::unordered_map<std::string_view, std::vector<std::size_t>> usable_by_hole;
    for (std::size_t i = 0; i < data.intervals.size(); ++i) {
        const LithInterval &v = data.intervals[i];
        const std::string subject =
            "interval " + span(v.top_m, v.base_m) + " of hole " + quoted(v.hole);
        const bool below_collar =
            requireNotNegative(out, Table::Intervals, i, "top_m", v.top_m, subject);
        if (!requireBaseBelowTop(out, Table::Intervals, i, v.top_m, v.base_m, false, subject))
            continue;
        usable_by_hole[v.hole].push_back(i);
        if (!below_collar)
            continue;

        const CoredPart *cored = coredPartOf(by_hole, v.hole);
        if (!cored)
            continue;
        const Coverage c = coverageOf(cored->blocks, v.top_m, v.base_m);
        reportCoverage(out, Table::Intervals, i, "top_m", numberText(v.top_m), subject, v.hole, c);
        if (c != Coverage::Inside)
            continue;
        // Runs overlapping (top, base): bases rise with tops as runs do not overlap.
        const auto &runs = cored->model->runs();
        auto it = std::upper_bound(runs.begin(), runs.end(), v.top_m,
                                   [](double d, const CoreRun &r) { return d < r.base_m; });
        for (; it != runs.end() && it->top_m < v.base_m; ++it) {
            const double from = std::max(v.top_m, recoveredBase_m(*it));
            const double to = std::min(v.base_m, it->base_m);
            if (to - from <= kRoundingSlack_m)
                continue;
            out.warning(Table::Intervals, i, "base_m", numberText(v.base_m),
                        subject + " extends into the unrecovered part of " + runText(*it) + ": " +
                            span(from, to) + " of it has no core behind it",
                        "recovered core is logged from the run top; log only the recovered "
                        "length, or correct recovered_m of run " +
                            quoted(it->run));
            break;
        }
    }

    for (auto &[hole_id, rows] : usable_by_hole) {
        std::sort(rows.begin(), rows.end(), [&](std::size_t a, std::size_t b) {
            const LithInterval &va = data.intervals[a], &vb = data.intervals[b];
            return va.top_m != vb.top_m ? va.top_m < vb.top_m : a < b;
        });
        std::optional<std::size_t> deepest;
        for (std::size_t row : rows) {
            const LithInterval &v = data.intervals[row];
            if (deepest && v.top_m < data.intervals[*deepest].base_m) {
                const LithInterval &other = data.intervals[*deepest];
                out.error(Table::Intervals, row, "top_m", numberText(v.top_m),
                          "interval " + span(v.top_m, v.base_m) + " overlaps the interval " +
                              span(other.top_m, other.base_m) + " in data row " +
                              std::to_string(*deepest + 1) + " of hole " + quoted(std::string(hole_id)),
                          "intervals of one hole must not overlap (touching is fine); correct "
                          "top_m or base_m of one of them");
            }
            if (!deepest || v.base_m > data.intervals[*deepest].base_m)
                deepest = row;
        }
    }
}

void warnIfUnrecovered(IssueList &out, Table table, std::size_t row, const char *column,
                       double depth_m, const CoredPart &cored, const std::string &subject) {
    const DepthLocation loc = cored.model->locate(depth_m);
    if (loc.part != DepthPart::Unrecovered)
        return;
    const CoreRun &run = cored.model->runs()[*loc.run_index];
    out.warning(table, row, column, numberText(depth_m),
                subject + " lies in the unrecovered part of " + runText(run) +
                    ": recovered core ends at " + derivedNumberText(recoveredBase_m(run)) + " m",
                "recovered core is logged from the run top; check the depth, or recovered_m of "
                "run " +
                    quoted(run.run));
}

void checkSamples(const CoreDataset &data, IssueList &out,
                  const std::unordered_map<std::string_view, HoleRuns> &by_hole) {
    for (std::size_t i = 0; i < data.samples.size(); ++i) {
        const Sample &s = data.samples[i];
        const std::string subject = "sample " + quoted(s.sample) + " of hole " + quoted(s.hole) +
                                    " at " + numberText(s.top_m) + " m";
        const bool below_collar =
            requireNotNegative(out, Table::Samples, i, "top_m", s.top_m, subject);
        if (!requireBaseBelowTop(out, Table::Samples, i, s.top_m, s.base_m, true, subject) ||
            !below_collar)
            continue;
        const CoredPart *cored = coredPartOf(by_hole, s.hole);
        if (!cored)
            continue;
        const Coverage c = coverageOf(cored->blocks, s.top_m, s.base_m);
        reportCoverage(out, Table::Samples, i, "top_m", numberText(s.top_m), subject, s.hole, c);
        if (c == Coverage::Inside)
            warnIfUnrecovered(out, Table::Samples, i, "top_m", s.top_m, *cored, subject);
    }
}

void checkDatedDepths(const CoreDataset &data, IssueList &out,
                      const std::unordered_map<std::string_view, HoleRuns> &by_hole) {
    for (std::size_t i = 0; i < data.dates.size(); ++i) {
        const NumericalDate &d = data.dates[i];
        if (!d.depth_m || !std::isfinite(*d.depth_m))
            continue;
        const std::string subject =
            "date of hole " + quoted(d.hole) + " at depth_m " + numberText(*d.depth_m);
        if (!requireNotNegative(out, Table::Dates, i, "depth_m", *d.depth_m, subject))
            continue;
        const CoredPart *cored = coredPartOf(by_hole, d.hole);
        if (!cored)
            continue;
        const Coverage c = coverageOf(cored->blocks, *d.depth_m, *d.depth_m);
        reportCoverage(out, Table::Dates, i, "depth_m", numberText(*d.depth_m), subject, d.hole, c);
        if (c == Coverage::Inside)
            warnIfUnrecovered(out, Table::Dates, i, "depth_m", *d.depth_m, *cored, subject);
    }
}

void checkHoles(const CoreDataset &data, IssueList &out,
                const std::unordered_map<std::string_view, HoleRuns> &by_hole) {
    for (std::size_t i = 0; i < data.holes.size(); ++i) {
        const Hole &h = data.holes[i];
        auto it = by_hole.find(h.hole);
        if (it == by_hole.end()) {
            if (h.kind == HoleKind::Core)
                out.warning(Table::Holes, i, "kind", std::string(toString(h.kind)),
                            "core hole " + quoted(h.hole) + " has no runs in runs.csv",
                            "add its core runs to runs.csv, or set kind to cuttings if it was "
                            "drilled without coring");
        } else if (!it->second.consistent) {
            out.warning(Table::Holes, i, "hole", h.hole,
                        "the runs of hole " + quoted(h.hole) +
                            " have errors, so its intervals, samples and dated depths were not "
                            "checked against the cored part",
                        "fix the errors in runs.csv and check again");
        }
    }
}

} // namespace

void validateRunsAndCoverage(const CoreDataset &data, IssueList &out) {
    std::unordered_map<std::string_view, HoleRuns> by_hole;
    checkRuns(data, out, by_hole);
    checkIntervals(data, out, by_hole);
    checkSamples(data, out, by_hole);
    checkDatedDepths(data, out, by_hole);
    checkHoles(data, out, by_hole);
}

} // namespace atollog::detail
