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
#include "cli/subsidence_run.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/reference_depth_curves.hpp"
#include "atollog/engine/subsidence.hpp"
#include "draw/subsidence_plot.hpp"

#include <filesystem>
#include <memory>
#include <optional>
#include <ostream>

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
        if (data.sea_level.empty())
            io.err << "warning: the project has no sea-level curve (sealevel.csv): sea level then "
                      "is taken as today's\n";

        const bool csv = o->csv;
        using A = TablePrinter::Align;
        TablePrinter samples({{"hole"}, {"sample"}, {"depth_m", A::Right}, {"age_q500_ma", A::Right},
                              {"subsidence_q025_m", A::Right}, {"subsidence_q500_m", A::Right},
                              {"subsidence_q975_m", A::Right}, {"rate_q500_m_per_myr", A::Right},
                              {"thermal_ps77_m", A::Right}, {"thermal_gdh1_m", A::Right}, {"flags"}});
        TablePrinter rates({{"hole"}, {"points", A::Right}, {"rate_m_per_myr", A::Right},
                            {"rate_sd_m_per_myr", A::Right}, {"mswd", A::Right}, {"flags"}});
        const auto holes = computeSubsidence(
            data, o->model, o->hole,
            [&io](const std::string& phase) {
                io.progress(phase);
                return true;
            },
            io.steps());
        for (const HoleSubsidence& h : holes) {
            for (const SampleSubsidence& s : h.samples) {
                const SubsidenceEstimate& e = s.estimate;
                std::string ps77, gdh1;
                if (o->plate_age_ma && e.age_ma.p50 < *o->plate_age_ma) {
                    const double then_ma = *o->plate_age_ma - e.age_ma.p50;
                    ps77 = formatNumber(expectedThermalSubsidenceM(ReferenceDepthCurve::ParsonsSclater1977,
                                                                   then_ma, *o->plate_age_ma), csv, 1);
                    gdh1 = formatNumber(expectedThermalSubsidenceM(ReferenceDepthCurve::SteinStein1992, then_ma, *o->plate_age_ma), csv, 1);
                }
                samples.addRow({h.hole->hole, s.sample->sample, formatNumber(s.sample->top_m, csv, 2),
                                formatNumber(e.age_ma.p50, csv, 4), formatNumber(e.subsidence_m.p2_5, csv, 1),
                                formatNumber(e.subsidence_m.p50, csv, 1), formatNumber(e.subsidence_m.p97_5, csv, 1),
                                e.rate_m_per_myr ? formatNumber(e.rate_m_per_myr->p50, csv, 1) : "",
                                ps77, gdh1, s.flags});
            }
            if (h.rate) {
                rates.addRow({h.hole->hole, std::to_string(h.rate->points),
                              formatNumber(h.rate->rate_m_per_myr, csv, 1),
                              formatNumber(h.rate->rate_sd_m_per_myr, csv, 1),
                              formatNumber(h.rate->mswd, csv, 2), h.hole_flags});
            } else {
                rates.addRow({h.hole->hole, std::to_string(h.points.size()), "", "", "",
                              h.hole_flags + (h.hole_flags.empty() ? "" : ";") + "too_few_points"});
            }
        }
        const draw::SubsidencePlotInput plot = subsidencePlotInput(holes);
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
