// `age`: the age-depth model of each hole from its datum picks and dates: age quantiles on a
// depth grid and at every sample, hiatuses, likely outlier ties; stored with its provenance and
// drawn as an age-depth plot.
#include "cli/age_model_inputs.hpp"
#include "cli/age_model_run.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/figure_inputs.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "draw/age_depth_plot.hpp"

#include <algorithm>
#include <filesystem>
#include <memory>
#include <ostream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

using A = TablePrinter::Align;

void drawPlot(const AgeModel& m, const HoleModelInputs& in, const fs::path& out, bool labels) {
    const draw::AgeDepthPlotInput p = ageDepthPlotInput(m, in);
    ensureGuiApplication();
    const auto list = draw::layoutAgeDepthPlot(p, ageDepthPlotStyle(p, labels));
    writeFigure(list, out, "--plot", "Age-depth model, hole " + m.hole, 200,
                draw::PdfPageSize::FitChart);
}

} // namespace

CommandRun addAgeCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string hole;
        std::string by = "summary";
        fs::path plot;
        bool plot_labels = false;
        bool csv = false;
        bool no_store = false;
        AgeModelOptions model;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "age", "Age-depth model of each hole from its datum picks and dates: a seeded Monte Carlo "
               "that keeps age increasing downward, with jumps allowed at logged hiatus surfaces. "
               "Age quantiles on a depth grid and at every sample, hiatus durations, likely "
               "outlier ties. Stored in the project with its settings and seed.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "Only this hole");
    sub->add_option("--by", o->by,
                    "summary: one row per hole; grid: age quantiles on the depth grid; sample: at "
                    "every sample; hiatus: every logged surface; tie: every tie with how far the "
                    "model pulls it")
        ->check(CLI::IsMember({"summary", "grid", "sample", "hiatus", "tie"}))
        ->capture_default_str();
    sub->add_option("--plot", o->plot, "Draw the age-depth plot of --hole to this .svg, .png or .pdf");
    sub->add_flag("--plot-labels", o->plot_labels,
                  "Label every tie in the plot (by default only when there are at most 30)");
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_flag("--no-store", o->no_store, "Do not store the models in the project");
    addAgeModelOptions(*sub, o->model);
    return [o, &io]() {
        if (!o->plot.empty() && o->hole.empty())
            throw std::invalid_argument("--plot draws one hole: give --hole as well");
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        const AgeModelRun run = buildAgeModels(
            data, o->model, o->hole,
            [&io](const std::string& phase) {
                io.progress(phase);
                return true;
            },
            io.steps());
        const auto& inputs = run.inputs;
        const auto& models = run.models;
        const bool csv = o->csv;
        if (o->by == "summary") {
            TablePrinter t({{"hole"}, {"ties", A::Right}, {"draws", A::Right},
                            {"log10_acceptance", A::Right}, {"top_m", A::Right}, {"base_m", A::Right},
                            {"base_age_q500_ma", A::Right}, {"hiatuses", A::Right},
                            {"likely_outlier"}});
            for (std::size_t i = 0; i < models.size(); ++i) {
                const auto& m = models[i];
                int hiatuses = 0;
                for (const auto& h : m.hiatuses) hiatuses += h.probability_positive >= 0.9 ? 1 : 0;
                t.addRow({m.hole, std::to_string(inputs[i].ties.size()), std::to_string(m.draws),
                          formatNumber(m.log10_acceptance, csv, 1),
                          formatNumber(m.grid.front().depth_m, csv, 2),
                          formatNumber(m.grid.back().depth_m, csv, 2),
                          formatNumber(m.grid.back().age_q500_ma, csv, 3), std::to_string(hiatuses),
                          leadingOutlier(m).value_or("")});
            }
            t.print(io.out, csv);
        } else if (o->by == "grid") {
            TablePrinter t({{"hole"}, {"depth_m", A::Right}, {"age_q025_ma", A::Right},
                            {"age_q500_ma", A::Right}, {"age_q975_ma", A::Right},
                            {"age_mean_ma", A::Right}, {"above_surface", A::Right}});
            for (const auto& m : models)
                for (const auto& r : m.grid)
                    t.addRow({m.hole, formatNumber(r.depth_m, csv, 2), formatNumber(r.age_q025_ma, csv, 4),
                              formatNumber(r.age_q500_ma, csv, 4), formatNumber(r.age_q975_ma, csv, 4),
                              formatNumber(r.age_mean_ma, csv, 4), r.above_surface ? "1" : "0"});
            t.print(io.out, csv);
        } else if (o->by == "sample") {
            TablePrinter t({{"hole"}, {"sample"}, {"depth_m", A::Right}, {"age_q025_ma", A::Right},
                            {"age_q500_ma", A::Right}, {"age_q975_ma", A::Right},
                            {"age_mean_ma", A::Right}});
            for (const auto& m : models)
                for (const auto& s : data.samples)
                    if (s.hole == m.hole)
                        if (const auto q = m.ageAt(s.top_m))
                            t.addRow({m.hole, s.sample, formatNumber(s.top_m, csv, 2),
                                      formatNumber(q->q025_ma, csv, 4), formatNumber(q->q500_ma, csv, 4),
                                      formatNumber(q->q975_ma, csv, 4), formatNumber(q->mean_ma, csv, 4)});
            t.print(io.out, csv);
        } else if (o->by == "hiatus") {
            TablePrinter t({{"hole"}, {"depth_m", A::Right}, {"duration_q025_ma", A::Right},
                            {"duration_q500_ma", A::Right}, {"duration_q975_ma", A::Right},
                            {"probability_positive", A::Right}});
            for (const auto& m : models)
                for (const auto& h : m.hiatuses) {
                    auto q = [&](const std::optional<double>& v) { return v ? formatNumber(*v, csv, 3) : std::string(); };
                    t.addRow({m.hole, formatNumber(h.depth_m, csv, 2), q(h.duration_q025_myr),
                              q(h.duration_q500_myr), q(h.duration_q975_myr),
                              formatNumber(h.probability_positive, csv, 2)});
                }
            t.print(io.out, csv);
        } else {
            TablePrinter t({{"hole"}, {"tie"}, {"depth_q500_m", A::Right}, {"age_q500_ma", A::Right},
                            {"z_score", A::Right}, {"likely_outlier"}});
            for (const auto& m : models)
                for (const auto& tail : m.tie_tails)
                    t.addRow({m.hole, tail.label, formatNumber(tail.depth_q500_m, csv, 2),
                              formatNumber(tail.age_q500_ma, csv, 4), formatNumber(tail.z_score, csv, 2),
                              tail.likely_outlier ? "yes" : ""});
            t.print(io.out, csv);
        }

        if (!o->plot.empty()) {
            drawPlot(models.front(), inputs.front(), o->plot, o->plot_labels);
            (csv ? io.err : io.out) << "drew the age-depth plot of " << o->hole << " to "
                                    << o->plot.string() << '\n';
        }
        if (o->no_store) return int(kOk);
        std::ostream& note = csv ? io.err : io.out;
        const StoredRunOutcome stored = storeAgeModelRun(store, data, o->model, o->hole, run);
        if (stored.unchanged)
            note << "age models unchanged since run #" << stored.run_id << '\n';
        else
            note << "stored the age models as run #" << stored.run_id << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
