#pragma once
// The viewer's figures (age-depth, range chart, rates, subsidence, line of correlation, chain)
// as plain requests and results, computed by the same command-line functions that draw them
// headless. No widgets here: the figure window runs makeFigure on a worker thread, tests call
// it directly.
#include "cli/age_model_inputs.hpp"
#include "cli/age_model_run.hpp"
#include "cli/phase_report.hpp"
#include "draw/display_list.hpp"

#include "atollog/engine/core_dataset.hpp"

#include <cstdint>
#include <filesystem>
#include <map>
#include <memory>
#include <mutex>
#include <optional>
#include <string>
#include <vector>

namespace atollog::view {

enum class FigureKind { AgeDepth, RangeChart, RatesDepth, RatesAge, Subsidence, Line, Chain };

/// The kinds in menu order, and their names there.
const std::vector<FigureKind>& figureKinds();
std::string figureKindName(FigureKind kind);
/// Which holes a kind needs: 0 (all holes), 1 (`hole`), 2 (`hole` and `with_hole`).
int holesNeeded(FigureKind kind);

struct FigureRequest {
    FigureKind kind = FigureKind::AgeDepth;
    std::string hole;      ///< the hole (the x hole of a line of correlation)
    std::string with_hole; ///< the y hole of a line of correlation
    cli::AgeModelOptions model; ///< age models, picks and dates, as the commands' options
};

struct FigureResult {
    draw::DisplayList list;
    std::string title; ///< for the window and the export's title block
    /// What happened to the age models: "stored as run #12", "unchanged since run #12",
    /// "reused from this session"; empty when the figure needs none.
    std::string models_note;
};

/// Age-model runs already built in this session, by dataset hash, settings and hole: asking
/// again for a figure of the same hole on the same data re-runs nothing. Thread-safe.
class AgeModelCache {
  public:
    std::shared_ptr<const cli::AgeModelRun> find(const std::string& key) const;
    void keep(const std::string& key, std::shared_ptr<const cli::AgeModelRun> run);
    std::size_t size() const;

  private:
    mutable std::mutex mutex_;
    std::map<std::string, std::shared_ptr<const cli::AgeModelRun>> runs_;
};

/// Opens `project` (its own connection: this may run on any thread), computes the figure and
/// lays it out. Age-depth and rate figures store their model run with its provenance unless
/// the newest run has the same settings, seed and inputs. Reports a phase before each long
/// step, and each block of an age model's draws to `step`; throws cli::AnalysisStopped when
/// either says stop, std::invalid_argument (or a db::ProjectError) with a message naming what
/// to fix.
FigureResult makeFigure(const std::filesystem::path& project, const FigureRequest& request,
                        AgeModelCache& cache, const cli::PhaseReport& phase = {},
                        const WorkProgress& step = {});

} // namespace atollog::view
