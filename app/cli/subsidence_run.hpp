#pragma once
// Subsidence since deposition of every sample with a logged water depth, hole by hole, from each
// hole's age-depth model: the `subsidence` command prints it, its --plot and the viewer's
// figures draw it. One function, so the table and the figure never disagree.
#include "cli/age_model_inputs.hpp"
#include "cli/phase_report.hpp"

#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/subsidence.hpp"
#include "draw/subsidence_plot_input.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::cli {

struct SampleSubsidence {
    const Sample* sample = nullptr; ///< points into the dataset given to computeSubsidence
    SubsidenceEstimate estimate;
    std::string flags; ///< "no_sea_level_curve", "beyond_sea_level_curve", ... ';'-separated
};

struct HoleSubsidence {
    const Hole* hole = nullptr;
    std::string hole_flags; ///< "no_collar_elevation" or ""
    std::vector<SampleSubsidence> samples;
    std::vector<SubsidencePoint> points; ///< the samples with a defined rate, for the fit
    std::optional<HoleSubsidenceRate> rate; ///< with three points or more
};

/// Every hole with ties (or only `hole`), with the samples that lie in an interval with a
/// logged water depth and above the deepest tie. `data` must outlive the result. A phase per
/// hole's age model, its blocks of draws to `step`; AnalysisStopped when either says stop.
std::vector<HoleSubsidence> computeSubsidence(const CoreDataset& data,
                                              const AgeModelOptions& options,
                                              const std::string& hole,
                                              const PhaseReport& phase = {},
                                              const WorkProgress& step = {});

/// The subsidence-against-age figure of the holes that have a point.
draw::SubsidencePlotInput subsidencePlotInput(const std::vector<HoleSubsidence>& holes);

} // namespace atollog::cli
