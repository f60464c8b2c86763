// `age`: the age-depth model of each hole from its datum picks and dates: age quantiles on a
// depth grid and at every sample, hiatuses, likely outlier ties; stored with its provenance and
// drawn as an age-depth plot.
#include "cli/age_model_inputs.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/engine/basement_age.hpp"

#include "atollog/db/age_model_store.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"
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

/// The most likely outlier: a tie whose posterior sits far in its own tail, else the tie whose
/// removal raises acceptance most, when either passes its threshold.
std::optional<std::string> leadingOutlier(const AgeModel& m) {
    if (!m.tie_tails.empty() && m.tie_tails.front().likely_outlier) return m.tie_tails.front().label;
    if (!m.outlier_ranking.empty() && m.outlier_ranking.front().likely_conflict)
        return m.outlier_ranking.front().label;
    return std::nullopt;
}

db::StoredAgeModel toStored(const AgeModel& m, const HoleModelInputs& in, const CoreDataset& data) {
    db::StoredAgeModel s;
    s.hole = m.hole;
    s.tie_count = static_cast<int>(in.ties.size());
    s.draws = m.draws;
    s.acceptance_rate = std::clamp(m.acceptance_rate, 0.0, 1.0);
    s.outlier_tie = leadingOutlier(m);
    for (const auto& r : m.grid)
        s.points.push_back({r.depth_m, std::nullopt, r.age_q025_ma, r.age_q500_ma, r.age_q975_ma,
                            r.age_mean_ma});
    for (const auto& sample : data.samples) {
        if (sample.hole != m.hole) continue;
        if (const auto q = m.ageAt(sample.top_m))
            s.points.push_back({sample.top_m, sample.sample, q->q025_ma, q->q500_ma, q->q975_ma,
                                q->mean_ma});
    }
    for (const auto& h : m.hiatuses)
        if (h.duration_q500_myr)
            s.hiatuses.push_back({h.depth_m, *h.duration_q025_myr, *h.duration_q500_myr,
                                  *h.duration_q975_myr, h.probability_positive});
    for (const auto& r : m.rates) {
        // Two ties at one depth (e.g. two dates of one sample) give no thickness: no rate.
        if (r.defined_share <= 0 || !(r.base_m > r.top_m)) continue;
        std::string flags = r.reef_framework ? "reef_framework" : "";
        if (r.reef_framework && r.median_outside_reef_range)
            flags += ";outside_reef_range";
        s.rates.push_back({r.label, r.top_m, r.base_m, r.rate_q025_m_per_myr, r.rate_q500_m_per_myr,
                           r.rate_q975_m_per_myr, flags});
    }
    return s;
}

draw::AgeDepthTie plotTie(const AgeTie& t, bool outlier, bool excluded) {
    return {t.label,
            t.source == AgeTieSource::Datum ? draw::AgeTieKind::Datum : draw::AgeTieKind::Date,
            t.shallow_m,
            t.deep_m,
            t.age.quantile(0.5),
            t.age.quantile(0.025),
            t.age.quantile(0.975),
            outlier,
            excluded};
}

/// Above this many ties the labels crowd each other: they are left off unless asked for.
constexpr std::size_t kMaxLabelledTies = 30;

void drawPlot(const AgeModel& m, const HoleModelInputs& in, const fs::path& out, bool labels) {
    draw::AgeDepthPlotInput p;
    p.hole = m.hole;
    p.top_m = 0;
    p.base_m = m.grid.empty() ? 1.0 : m.grid.back().depth_m;
    for (const auto& r : m.grid) p.model.push_back({r.depth_m, r.age_q025_ma, r.age_q500_ma, r.age_q975_ma});
    const auto outlier = leadingOutlier(m);
    auto inside = [&](const AgeTie& t) { return t.shallow_m >= p.top_m && t.deep_m <= p.base_m; };
    // The ties as the model saw them: lava dates below a logged contact pooled into one.
    const std::vector<AgeTie> ties =
        in.basement_contact_m ? poolBasementTies(in.ties, *in.basement_contact_m) : in.ties;
    for (const auto& t : ties)
        if (inside(t)) p.ties.push_back(plotTie(t, outlier && *outlier == t.label, false));
    for (const auto& t : in.excluded)
        if (inside(t)) p.ties.push_back(plotTie(t, false, true));
    int n = 0;
    for (const auto& h : m.hiatuses)
        if (h.duration_q500_myr && h.probability_positive >= 0.5 && h.depth_m <= p.base_m)
            p.hiatuses.push_back({h.depth_m, *h.duration_q500_myr, "H" + std::to_string(++n)});
    ensureGuiApplication();
    draw::AgeDepthPlotStyle style;
    style.show_tie_labels = labels || p.ties.size() <= kMaxLabelledTies;
    const auto list = draw::layoutAgeDepthPlot(p, style);
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
        const auto inputs = gatherAgeModelInputs(data, o->model, o->hole);
        std::vector<AgeModel> models;
        for (const auto& in : inputs) {
            io.progress("age model of " + in.hole + " (" + std::to_string(in.ties.size()) + " ties)");
            models.push_back(buildHoleModel(in, o->model));
        }
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
        db::ModelRunRecord run;
        run.kind = "age-model";
        run.settings = o->model.settingsText() + (o->hole.empty() ? "" : "\nage.hole=" + o->hole);
        run.seed = o->model.seed;
        run.inputs_sha256 = db::ProjectStore::datasetHash(data);
        std::ostream& note = csv ? io.err : io.out;
        if (const auto same = db::sameLatestRun(store, run)) {
            note << "age models unchanged since run #" << same->id << '\n';
            return int(kOk);
        }
        std::vector<db::StoredAgeModel> stored;
        for (std::size_t i = 0; i < models.size(); ++i) stored.push_back(toStored(models[i], inputs[i], data));
        run.summary = std::to_string(models.size()) + (models.size() == 1 ? " hole" : " holes");
        note << "stored the age models as run #" << db::storeAgeModels(store, run, stored) << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
