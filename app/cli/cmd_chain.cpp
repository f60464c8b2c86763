// `chain`: how fast the plate carries the islands away from the active volcanic centre, from
// each hole's basement age against its distance along the chain (York et al. 2004).
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/figure_inputs.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/chain_migration.hpp"
#include "draw/chain_plot.hpp"

#include <filesystem>
#include <memory>
#include <ostream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {

CommandRun addChainCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        double distance_sd_km = kDefaultChainDistanceSdKm;
        bool points = false;
        bool csv = false;
        fs::path plot;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "chain", "Migration rate along the volcanic chain: a straight line of basement age against "
                 "distance with errors in both (York et al. 2004), ordinary least squares beside it.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--distance-sd-km", o->distance_sd_km,
                    "Uncertainty of each hole's distance along the chain (km, 1 sd): where on the "
                    "volcano's footprint the hole sits relative to its vent")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub->add_flag("--points", o->points, "Print the basement age of each hole instead of the fit");
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_option("--plot", o->plot,
                    "Draw basement age against distance with the fitted line to this .svg, .png "
                    "or .pdf");
    return [o, &io]() {
        if (!o->plot.empty()) figureFormatOf(o->plot, "--plot");
        const auto store = db::ProjectStore::open(o->project);
        const auto points = basementAgesFromDataset(store.loadDataset(), o->distance_sd_km);
        using A = TablePrinter::Align;
        const bool csv = o->csv;
        TablePrinter pointTable({{"hole"}, {"distance_km", A::Right}, {"distance_sd_km", A::Right},
                                 {"basement_age_ma", A::Right}, {"age_sd_ma", A::Right}});
        for (const auto& p : points)
            pointTable.addRow({p.hole, formatNumber(p.distance_km, csv, 1),
                               formatNumber(p.distance_sd_km, csv, 1), formatNumber(p.age_ma, csv, 3),
                               formatNumber(p.age_sd_ma, csv, 3)});
        if (o->points) {
            pointTable.print(io.out, csv);
            return int(kOk);
        }
        if (points.size() < 3)
            throw std::invalid_argument(
                "a chain fit needs at least 3 holes with chain_km and a volcanic (ar-ar or k-ar) "
                "date; the project has " + std::to_string(points.size()));
        const ChainMigration fit = chainMigration(points);
        if (!fit.ages_increase_along_chain())
            throw std::invalid_argument(
                "basement ages do not increase along the chain (York slope " +
                formatNumber(fit.york.slope, false, 5) +
                " Ma/km): no migration rate; check chain_km and the volcanic dates");
        TablePrinter table({{"rate_mm_per_yr", A::Right}, {"rate_sd_mm_per_yr", A::Right},
                            {"rate_cm_per_yr", A::Right}, {"intercept_ma", A::Right},
                            {"intercept_sd_ma", A::Right}, {"mswd", A::Right},
                            {"points", A::Right}, {"ols_rate_mm_per_yr", A::Right}});
        table.addRow({formatNumber(*fit.rate_km_per_myr, csv, 1),
                      formatNumber(*fit.rate_sd_km_per_myr, csv, 1),
                      formatNumber(cmPerYrFromKmPerMyr(*fit.rate_km_per_myr), csv, 2),
                      formatNumber(fit.intercept_ma, csv, 3), formatNumber(fit.intercept_sd_ma, csv, 3),
                      formatNumber(fit.mswd, csv, 2), std::to_string(fit.points),
                      fit.ols_rate_km_per_myr ? formatNumber(*fit.ols_rate_km_per_myr, csv, 1) : ""});
        if (!csv) {
            pointTable.printText(io.out);
            io.out << '\n';
        }
        table.print(io.out, csv);
        if (!o->plot.empty()) {
            const draw::ChainPlotInput plot = chainPlotInput(points, fit);
            ensureGuiApplication();
            writeFigure(draw::layoutChainPlot(plot), o->plot, "--plot",
                        "Age against distance along the chain", 200, draw::PdfPageSize::FitChart);
            (csv ? io.err : io.out) << "drew age against distance to " << o->plot.string() << '\n';
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
