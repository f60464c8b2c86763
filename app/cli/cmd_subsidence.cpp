// `subsidence`: how far each sample with a water-depth indicator has sunk since it was laid
// down, from its present depth below sea level, the water depth then and the sea level then,
// over the age model's draws; a subsidence rate per hole; and, for a plate age the user gives,
// what thermal subsidence of the ocean floor alone would predict (Parsons & Sclater 1977;
// Stein & Stein 1992).
#include "cli/age_model_inputs.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/reference_depth_curves.hpp"
#include "atollog/engine/sea_level_curve.hpp"
#include "atollog/engine/seeded_draws.hpp"
#include "atollog/engine/subsidence.hpp"
#include "draw/subsidence_plot.hpp"

#include <filesystem>
#include <memory>
#include <optional>
#include <ostream>
#include <unordered_map>

namespace fs = std::filesystem;

namespace atollog::cli {

CommandRun addSubsidenceCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string hole;
        std::optional<double> plate_age_ma;
        bool per_hole = false;
        bool csv = false;
        fs::path plot;
        AgeModelOptions model;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "subsidence",
        "Subsidence since deposition of every sample in an interval with a logged water depth: "
        "present depth below sea level (drilled depth less collar elevation) + water depth then "
        "- sea level then (sealevel.csv), over the age model's draws; a rate per hole.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "Only this hole");
    sub->add_option("--plate-age-ma", o->plate_age_ma,
                    "Age of the oceanic plate under the islands today (Ma): adds the thermal "
                    "subsidence predicted since each sample's age by Parsons & Sclater 1977 and "
                    "Stein & Stein 1992")
        ->check(CLI::PositiveNumber);
    sub->add_flag("--per-hole", o->per_hole, "Print the subsidence rate of each hole instead");
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_option("--plot", o->plot,
                    "Draw subsidence against age (every hole, or --hole) to this .svg, .png or .pdf");
    addAgeModelOptions(*sub, o->model);
    return [o, &io]() {
        if (!o->plot.empty()) figureFormatOf(o->plot, "--plot"); // refuse before the long work
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        const SeaLevelCurve sea_level = data.sea_level.empty() ? SeaLevelCurve{} : SeaLevelCurve(data.sea_level);
        if (data.sea_level.empty())
            io.err << "warning: the project has no sea-level curve (sealevel.csv): sea level then "
                      "is taken as today's\n";
        std::unordered_map<std::string, const Hole*> holes;
        for (const auto& h : data.holes) holes[h.hole] = &h;

        const bool csv = o->csv;
        using A = TablePrinter::Align;
        TablePrinter samples({{"hole"}, {"sample"}, {"depth_m", A::Right}, {"age_q500_ma", A::Right},
                              {"subsidence_q025_m", A::Right}, {"subsidence_q500_m", A::Right},
                              {"subsidence_q975_m", A::Right}, {"rate_q500_m_per_myr", A::Right},
                              {"thermal_ps77_m", A::Right}, {"thermal_gdh1_m", A::Right}, {"flags"}});
        TablePrinter rates({{"hole"}, {"points", A::Right}, {"rate_m_per_myr", A::Right},
                            {"rate_sd_m_per_myr", A::Right}, {"mswd", A::Right}, {"flags"}});
        draw::SubsidencePlotInput plot;
        plot.note = "each dated horizon's median with its 95 % ranges; lines: York fit per hole "
                    "(York et al. 2004)";
        for (const auto& in : gatherAgeModelInputs(data, o->model, o->hole)) {
            draw::SubsidencePlotHole plot_hole{in.hole, {}, std::nullopt};
            const Hole& hole = *holes.at(in.hole);
            std::string hole_flags = hole.collar_elev_m ? "" : "no_collar_elevation";
            // Samples in intervals that carry a water depth, within the model's depth range.
            struct Target { const Sample* sample; double min_m, max_m; };
            std::vector<Target> targets;
            double deepest_m = 0;
            for (const auto& t : in.ties) deepest_m = std::max(deepest_m, t.deep_m);
            for (const auto& s : data.samples) {
                if (s.hole != in.hole || s.top_m > deepest_m) continue;
                for (const auto& iv : data.intervals)
                    if (iv.hole == in.hole && iv.paleodepth_min_m && iv.paleodepth_max_m &&
                        s.top_m >= iv.top_m && s.top_m < iv.base_m) {
                        targets.push_back({&s, *iv.paleodepth_min_m, *iv.paleodepth_max_m});
                        break;
                    }
            }
            std::vector<double> keep;
            for (const auto& t : targets) keep.push_back(t.sample->top_m);
            io.progress("age model of " + in.hole + " at " + std::to_string(keep.size()) + " samples");
            const AgeModel m = buildHoleModel(in, o->model, keep);
            std::vector<SubsidencePoint> points;
            for (std::size_t i = 0; i < targets.size(); ++i) {
                const auto& t = targets[i];
                const auto e = subsidenceDraws(t.sample->top_m, hole.collar_elev_m.value_or(0.0),
                                               t.min_m, t.max_m, m.kept_age_draws_ma[i], sea_level,
                                               streamSeed(o->model.seed, i));
                std::string flags = hole_flags;
                auto add = [&flags](const char* f) { flags += (flags.empty() ? "" : ";") + std::string(f); };
                if (e.no_sea_level_curve) add("no_sea_level_curve");
                if (e.draws_beyond_sea_level_curve > 0) add("beyond_sea_level_curve");
                if (e.rate_undefined_young_age) add("rate_undefined_young_age");
                std::string ps77, gdh1;
                if (o->plate_age_ma && e.age_ma.p50 < *o->plate_age_ma) {
                    const double then_ma = *o->plate_age_ma - e.age_ma.p50;
                    ps77 = formatNumber(expectedThermalSubsidenceM(ReferenceDepthCurve::ParsonsSclater1977,
                                                                   then_ma, *o->plate_age_ma), csv, 1);
                    gdh1 = formatNumber(expectedThermalSubsidenceM(ReferenceDepthCurve::SteinStein1992, then_ma, *o->plate_age_ma), csv, 1);
                }
                samples.addRow({in.hole, t.sample->sample, formatNumber(t.sample->top_m, csv, 2),
                                formatNumber(e.age_ma.p50, csv, 4), formatNumber(e.subsidence_m.p2_5, csv, 1),
                                formatNumber(e.subsidence_m.p50, csv, 1), formatNumber(e.subsidence_m.p97_5, csv, 1),
                                e.rate_m_per_myr ? formatNumber(e.rate_m_per_myr->p50, csv, 1) : "",
                                ps77, gdh1, flags});
                if (!e.rate_undefined_young_age) points.push_back(subsidencePoint(t.sample->sample, e));
                plot_hole.points.push_back({t.sample->sample, e.age_ma.p50, e.age_ma.p2_5,
                                            e.age_ma.p97_5, e.subsidence_m.p50,
                                            e.subsidence_m.p2_5, e.subsidence_m.p97_5});
            }
            if (points.size() >= 3) {
                const auto r = holeSubsidenceRate(points);
                plot_hole.rate = draw::SubsidenceRateLine{r.rate_m_per_myr, r.rate_sd_m_per_myr,
                                                          r.intercept_m};
                rates.addRow({in.hole, std::to_string(r.points), formatNumber(r.rate_m_per_myr, csv, 1),
                              formatNumber(r.rate_sd_m_per_myr, csv, 1), formatNumber(r.mswd, csv, 2),
                              hole_flags});
            } else {
                rates.addRow({in.hole, std::to_string(points.size()), "", "", "",
                              hole_flags + (hole_flags.empty() ? "" : ";") + "too_few_points"});
            }
            if (!plot_hole.points.empty()) plot.holes.push_back(std::move(plot_hole));
        }
        (o->per_hole ? rates : samples).print(io.out, csv);
        if (!o->plot.empty()) {
            if (plot.holes.empty())
                throw std::invalid_argument("--plot: no hole has a sample in an interval with a "
                                            "logged water depth; nothing to draw");
            ensureGuiApplication();
            writeFigure(draw::layoutSubsidencePlot(plot), o->plot, "--plot",
                        "Subsidence against age", 200, draw::PdfPageSize::FitChart);
            (csv ? io.err : io.out) << "drew subsidence against age to " << o->plot.string() << '\n';
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
