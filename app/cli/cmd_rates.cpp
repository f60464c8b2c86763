// `rates`: accretion (linear sedimentation) rates from the age model's draws, between ties and
// per reef package, with decompacted rates and mass and carbonate accumulation where logged.
#include "cli/age_model_inputs.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/figure_inputs.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/accumulation.hpp"
#include "atollog/engine/decompaction.hpp"
#include "atollog/engine/rate_units.hpp"
#include "draw/rate_plot.hpp"

#include <filesystem>
#include <memory>
#include <ostream>
#include <sstream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

/// Thickness-weighted mean of a logged property over [top_m, base_m]; nullopt where nothing of
/// the package carries it.
template <class Get>
std::optional<double> meanOver(const CoreDataset& data, const std::string& hole, double top_m,
                               double base_m, Get get) {
    double sum = 0, weight = 0;
    for (const auto& iv : data.intervals) {
        if (iv.hole != hole) continue;
        const std::optional<double> v = get(iv);
        const double overlap = std::min(base_m, iv.base_m) - std::max(top_m, iv.top_m);
        if (!v || overlap <= 0) continue;
        sum += *v * overlap;
        weight += overlap;
    }
    if (weight <= 0) return std::nullopt;
    return sum / weight;
}

PorosityLaw parseLaw(const std::string& text) {
    std::istringstream in(text);
    PorosityLaw law;
    char comma = 0;
    if (!(in >> law.phi0 >> comma >> law.decay_length_m) || comma != ',' || !in.eof() ||
        !(law.phi0 >= 0 && law.phi0 < 1) || !(law.decay_length_m > 0))
        throw std::invalid_argument(
            "--porosity-law '" + text +
            "': expected PHI0,DECAY_M with 0 <= PHI0 < 1 (surface porosity as a fraction) and "
            "DECAY_M > 0 (depth in m over which porosity falls by a factor e), e.g. 0.5,2000");
    return law;
}

} // namespace

CommandRun addRatesCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string hole;
        std::string porosity_law;
        bool csv = false;
        fs::path plot;
        std::string plot_along = "depth";
        AgeModelOptions model;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "rates", "Accretion rates from the age model's draws (m/Myr and mm/yr, 2.5/50/97.5 %), "
                 "between consecutive ties and per carbonate package between logged surfaces; "
                 "decompacted rates with a porosity law; mass and carbonate accumulation where "
                 "dry density and CaCO3 are logged. Reef packages outside 1-10 mm/yr are flagged.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "Only this hole");
    sub->add_option("--porosity-law", o->porosity_law,
                    "Porosity-depth law of the carbonate, PHI0,DECAY_M (Sclater & Christie 1980 "
                    "form phi = PHI0 exp(-z/DECAY_M)); no published limestone pair is built in");
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_option("--plot", o->plot,
                    "Draw the rates of --hole against depth or age to this .svg, .png or .pdf");
    sub->add_option("--plot-along", o->plot_along,
                    "depth: rates against depth (m); age: against the model's median age (Ma)")
        ->check(CLI::IsMember({"depth", "age"}))
        ->capture_default_str();
    addAgeModelOptions(*sub, o->model);
    return [o, &io]() {
        if (!o->plot.empty()) {
            if (o->hole.empty())
                throw std::invalid_argument("--plot draws one hole: give --hole as well");
            figureFormatOf(o->plot, "--plot"); // refuse before the long work
        }
        const auto along =
            o->plot_along == "age" ? draw::RatePlotAlong::Age : draw::RatePlotAlong::Depth;
        draw::RatePlotInput plot;
        plot.hole = o->hole;
        plot.along = along;
        const std::optional<PorosityLaw> law =
            o->porosity_law.empty() ? std::nullopt : std::optional(parseLaw(o->porosity_law));
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        TablePrinter t({{"hole"}, {"interval"}, {"top_m", A::Right}, {"base_m", A::Right},
                        {"rate_q025_m_per_myr", A::Right}, {"rate_q500_m_per_myr", A::Right},
                        {"rate_q975_m_per_myr", A::Right}, {"rate_q500_mm_per_yr", A::Right},
                        {"decompacted_q500_m_per_myr", A::Right},
                        {"mar_q500_g_cm2_kyr", A::Right}, {"car_q500_g_cm2_kyr", A::Right},
                        {"flags"}});
        for (const auto& in : gatherAgeModelInputs(data, o->model, o->hole)) {
            io.progress("age model of " + in.hole);
            const AgeModel m = buildHoleModel(in, o->model, {}, io.steps());
            for (const auto& r : m.rates) {
                // Two ties at one depth (e.g. two dates of one sample) give no thickness: no rate.
                if (r.defined_share <= 0 || !(r.base_m > r.top_m)) continue;
                if (const auto p = ratePlotInterval(r, m, along)) plot.intervals.push_back(*p);
                std::string decompacted, mar, car;
                std::string flags = r.between_ties ? "between_ties" : "package";
                if (r.reef_framework) flags += ";reef_framework";
                if (r.reef_framework && r.median_outside_reef_range) flags += ";outside_reef_range";
                if (law) {
                    // Restored to the surface: the thickness it had when it was laid down.
                    const auto restored = decompactLayer(r.top_m, r.base_m, 0.0, *law);
                    decompacted = formatNumber(r.rate_q500_m_per_myr * restored.thickness_m() /
                                                   (r.base_m - r.top_m), csv, 1);
                }
                const auto density = meanOver(data, in.hole, r.top_m, r.base_m,
                                              [](const LithInterval& iv) { return iv.dry_density_g_cm3; });
                if (density) {
                    const double lsr_cm_per_kyr = cmPerKyrFromMPerMyr(r.rate_q500_m_per_myr);
                    const double mar_value = massAccumulationRate_g_cm2_kyr(lsr_cm_per_kyr, *density);
                    mar = formatNumber(mar_value, csv, 2);
                    const auto caco3 = meanOver(data, in.hole, r.top_m, r.base_m,
                                                [](const LithInterval& iv) { return iv.caco3_pct; });
                    if (caco3) car = formatNumber(carbonateAccumulationRate_g_cm2_kyr(mar_value, *caco3), csv, 2);
                }
                t.addRow({in.hole, r.label, formatNumber(r.top_m, csv, 2), formatNumber(r.base_m, csv, 2),
                          formatNumber(r.rate_q025_m_per_myr, csv, 1), formatNumber(r.rate_q500_m_per_myr, csv, 1),
                          formatNumber(r.rate_q975_m_per_myr, csv, 1), formatNumber(r.rate_q500_mm_per_yr, csv, 3),
                          decompacted, mar, car, flags});
            }
        }
        t.print(io.out, csv);
        if (!o->plot.empty()) {
            if (plot.intervals.empty())
                throw std::invalid_argument("--plot: hole " + o->hole +
                                            " has no rate interval to draw");
            ensureGuiApplication();
            writeFigure(draw::layoutRatePlot(plot), o->plot, "--plot",
                        "Accretion rates, hole " + o->hole, 200, draw::PdfPageSize::FitChart);
            (csv ? io.err : io.out) << "drew the rates of " << o->hole << " against "
                                    << o->plot_along << " to " << o->plot.string() << '\n';
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
