// `chart`: the range chart of a hole, drawn headless to SVG, PNG or PDF.
#include "cli/biostrat_options.hpp"
#include "cli/chart_input.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"

#include "atollog/db/project_store.hpp"
#include "draw/range_chart.hpp"

#include <algorithm>
#include <filesystem>
#include <memory>
#include <ostream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {

CommandRun addChartCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project, out;
        std::string hole;
        std::vector<std::string> taxa;
        double scale = 200;
        double dpi = 200;
        std::string page = "fit";
        BiostratOptions biostrat;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "chart", "Draw the range chart of a hole (taxa as bars against depth, samples, datum "
                 "picks with their brackets) to an SVG, PNG or PDF file.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "The hole to draw")->required();
    sub->add_option("--out", o->out, "Output file: .svg, .png or .pdf")->required();
    sub->add_option("--taxa", o->taxa, "Only these taxa, in this order (default: every taxon "
                                       "found in the hole, deepest range first)")
        ->delimiter(',');
    sub->add_option("--scale", o->scale, "Vertical scale 1:N (e.g. 200)")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub->add_option("--dpi", o->dpi, "Resolution of a PNG")->check(CLI::Range(30.0, 1200.0))
        ->capture_default_str();
    sub->add_option("--page", o->page, "PDF page: fit, a4, a3 or letter")
        ->check(CLI::IsMember({"fit", "a4", "a3", "letter"}))
        ->capture_default_str();
    addBiostratOptions(*sub, o->biostrat);
    return [o, &io]() {
        figureFormatOf(o->out, "--out"); // refuse a bad name before any work
        const auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        if (std::none_of(data.holes.begin(), data.holes.end(),
                         [&](const Hole& h) { return h.hole == o->hole; }))
            throw std::invalid_argument("no hole '" + o->hole + "' in the project");
        const BiostratResult result = runBiostratigraphy(data, o->biostrat.settings());
        const auto input = rangeChartInputFor(data, result, o->hole, o->taxa, o->scale);

        ensureGuiApplication();
        const draw::DisplayList chart = draw::layoutRangeChart(input);
        const auto page = o->page == "a4"       ? draw::PdfPageSize::A4
                          : o->page == "a3"     ? draw::PdfPageSize::A3
                          : o->page == "letter" ? draw::PdfPageSize::Letter
                                                : draw::PdfPageSize::FitChart;
        writeFigure(chart, o->out, "--out", "Range chart, hole " + o->hole, o->dpi, page);
        io.out << "drew " << input.taxa.size() << " taxa and " << input.picks.size()
               << " picks of hole " << o->hole << " to " << o->out.string() << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
