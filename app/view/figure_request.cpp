#include "view/figure_request.hpp"

#include "cli/chart_input.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/figure_inputs.hpp"
#include "cli/subsidence_run.hpp"
#include "draw/age_depth_plot.hpp"
#include "draw/chain_plot.hpp"
#include "draw/loc_plot.hpp"
#include "draw/range_chart.hpp"
#include "draw/rate_plot.hpp"
#include "draw/subsidence_plot.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/chain_migration.hpp"
#include "atollog/engine/line_of_correlation.hpp"

#include <algorithm>
#include <stdexcept>

namespace atollog::view {
namespace {

/// The vertical scale of the range chart in the viewer (the command's default).
constexpr double kRangeChartScale = 200.0;

void requireHole(const CoreDataset& data, const std::string& hole, const char* role) {
    if (hole.empty()) throw std::invalid_argument(std::string("choose ") + role + " for this figure");
    if (std::none_of(data.holes.begin(), data.holes.end(),
                     [&](const Hole& h) { return h.hole == hole; }))
        throw std::invalid_argument("no hole '" + hole + "' in the project");
}

struct ModelsFor {
    std::shared_ptr<const cli::AgeModelRun> run;
    std::string note;
};

/// The hole's age-model run: from the cache, else built and stored.
ModelsFor ageModelsFor(db::ProjectStore& store, const CoreDataset& data,
                       const FigureRequest& r, AgeModelCache& cache,
                       const cli::PhaseReport& phase, const WorkProgress& step) {
    const db::ModelRunRecord record = cli::ageModelRunRecord(data, r.model, r.hole);
    const std::string key = record.inputs_sha256 + "\n" + record.settings;
    if (auto run = cache.find(key)) return {run, "age model reused from this session"};
    auto run = std::make_shared<const cli::AgeModelRun>(
        cli::buildAgeModels(data, r.model, r.hole, phase, step));
    cli::reportPhase(phase, "storing the age model with its provenance");
    const cli::StoredRunOutcome stored = cli::storeAgeModelRun(store, data, r.model, r.hole, *run);
    cache.keep(key, run);
    return {run, stored.unchanged ? "age model unchanged since run #" + std::to_string(stored.run_id)
                                  : "age model stored as run #" + std::to_string(stored.run_id)};
}

} // namespace

const std::vector<FigureKind>& figureKinds() {
    static const std::vector<FigureKind> kinds{
        FigureKind::AgeDepth,   FigureKind::RangeChart, FigureKind::RatesDepth, FigureKind::RatesAge,
        FigureKind::Subsidence, FigureKind::Line,       FigureKind::Chain};
    return kinds;
}

std::string figureKindName(FigureKind kind) {
    switch (kind) {
    case FigureKind::AgeDepth: return "Age against depth";
    case FigureKind::RangeChart: return "Range chart";
    case FigureKind::RatesDepth: return "Accretion rate against depth";
    case FigureKind::RatesAge: return "Accretion rate against age";
    case FigureKind::Subsidence: return "Subsidence against age";
    case FigureKind::Line: return "Line of correlation";
    case FigureKind::Chain: return "Age against chain distance";
    }
    return "figure";
}

int holesNeeded(FigureKind kind) {
    switch (kind) {
    case FigureKind::Subsidence:
    case FigureKind::Chain: return 0;
    case FigureKind::Line: return 2;
    default: return 1;
    }
}

std::shared_ptr<const cli::AgeModelRun> AgeModelCache::find(const std::string& key) const {
    const std::lock_guard lock(mutex_);
    const auto it = runs_.find(key);
    return it == runs_.end() ? nullptr : it->second;
}

void AgeModelCache::keep(const std::string& key, std::shared_ptr<const cli::AgeModelRun> run) {
    const std::lock_guard lock(mutex_);
    runs_[key] = std::move(run);
}

std::size_t AgeModelCache::size() const {
    const std::lock_guard lock(mutex_);
    return runs_.size();
}

FigureResult makeFigure(const std::filesystem::path& project, const FigureRequest& r,
                        AgeModelCache& cache, const cli::PhaseReport& phase,
                        const WorkProgress& step) {
    cli::reportPhase(phase, "reading the project");
    db::ProjectStore store = db::ProjectStore::open(project);
    const CoreDataset data = store.loadDataset();
    FigureResult out;
    switch (r.kind) {
    case FigureKind::AgeDepth: {
        requireHole(data, r.hole, "a hole");
        const ModelsFor m = ageModelsFor(store, data, r, cache, phase, step);
        const draw::AgeDepthPlotInput p =
            cli::ageDepthPlotInput(m.run->models.front(), m.run->inputs.front());
        out.list = draw::layoutAgeDepthPlot(p, cli::ageDepthPlotStyle(p, false));
        out.title = "Age-depth model, hole " + r.hole;
        out.models_note = m.note;
        break;
    }
    case FigureKind::RangeChart: {
        requireHole(data, r.hole, "a hole");
        cli::reportPhase(phase, "picking first and last occurrences");
        const BiostratResult result = runBiostratigraphy(data, r.model.biostrat.settings());
        out.list = draw::layoutRangeChart(
            cli::rangeChartInputFor(data, result, r.hole, {}, kRangeChartScale));
        out.title = "Range chart, hole " + r.hole;
        break;
    }
    case FigureKind::RatesDepth:
    case FigureKind::RatesAge: {
        requireHole(data, r.hole, "a hole");
        const ModelsFor m = ageModelsFor(store, data, r, cache, phase, step);
        const auto along = r.kind == FigureKind::RatesAge ? draw::RatePlotAlong::Age
                                                          : draw::RatePlotAlong::Depth;
        const draw::RatePlotInput p = cli::ratePlotInput(m.run->models.front(), along);
        if (p.intervals.empty())
            throw std::invalid_argument("hole " + r.hole + " has no accretion rate to draw: it "
                                        "needs two ties at different depths");
        out.list = draw::layoutRatePlot(p);
        out.title = "Accretion rates, hole " + r.hole;
        out.models_note = m.note;
        break;
    }
    case FigureKind::Subsidence: {
        const auto holes = cli::computeSubsidence(data, r.model, "", phase, step);
        const draw::SubsidencePlotInput p = cli::subsidencePlotInput(holes);
        if (p.holes.empty())
            throw std::invalid_argument("no hole has a sample in an interval with a logged water "
                                        "depth; log paleodepth_min_m and paleodepth_max_m first");
        out.list = draw::layoutSubsidencePlot(p);
        out.title = "Subsidence against age";
        break;
    }
    case FigureKind::Line: {
        requireHole(data, r.hole, "the hole along the bottom");
        requireHole(data, r.with_hole, "the hole down the side");
        if (r.hole == r.with_hole)
            throw std::invalid_argument("a line of correlation needs two different holes");
        cli::reportPhase(phase, "gathering the events of every hole");
        cli::CorrelationOptions options;
        options.biostrat = r.model.biostrat;
        options.dates = r.model.dates;
        const CorrelationData c = cli::gatherCorrelationData(data, options);
        const std::size_t x = cli::holeIndex(c, r.hole), y = cli::holeIndex(c, r.with_hole);
        const LineOfCorrelation loc = lineOfCorrelation(c, x, y, LocSettings{});
        out.list = draw::layoutLocPlot(cli::locPlotInput(loc, c, x, y));
        out.title = "Line of correlation " + r.hole + " - " + r.with_hole;
        break;
    }
    case FigureKind::Chain: {
        const auto points = basementAgesFromDataset(data, kDefaultChainDistanceSdKm);
        const ChainMigration fit = chainMigration(points);
        out.list = draw::layoutChainPlot(cli::chainPlotInput(points, fit));
        out.title = "Age against distance along the chain";
        break;
    }
    }
    return out;
}

} // namespace atollog::view
