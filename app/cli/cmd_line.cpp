// `line`: a line of correlation (Shaw 1964) between two holes, or between a hole and the latest
// stored composite sequence: shared events cross-plotted, fitted with errors in both (York et
// al. 2004) or by reduced major axis, broken at logged surfaces, events off the line flagged.
#include "cli/command.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/figure_file.hpp"
#include "cli/figure_inputs.hpp"
#include "cli/gui_context.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/sequence_store.hpp"
#include "atollog/db/tie_point_store.hpp"
#include "atollog/engine/line_of_correlation.hpp"
#include "draw/loc_plot.hpp"

#include <filesystem>
#include <map>
#include <memory>
#include <ostream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {

namespace {

/// The latest stored sequence as event indices of `data`, oldest first; events the sequence
/// does not know (data changed since) are left out of the axis.
std::vector<std::size_t> storedComposite(db::ProjectStore& store, const CorrelationData& data) {
    const auto run = db::latestModelRun(store, "sequence");
    if (!run)
        throw std::invalid_argument("--composite needs a stored composite sequence: run "
                                    "`atollog sequence PROJECT` first");
    std::map<std::string, std::size_t> index;
    for (std::size_t i = 0; i < data.events.size(); ++i) index.emplace(data.events[i].id, i);
    std::vector<std::size_t> order;
    for (const auto& e : db::loadSequence(store, run->id))
        if (const auto it = index.find(e.event); it != index.end()) order.push_back(it->second);
    return order;
}

} // namespace

CommandRun addLineCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string x, y;
        bool composite = false;
        std::string fit = "york";
        double off_line_z = 3.0;
        bool no_breaks = false;
        std::string by = "point";
        bool csv = false;
        fs::path plot;
        bool plot_labels = false;
        CorrelationOptions correlation;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "line", "Line of correlation (Shaw 1964): the shared events of two holes (or a hole and the "
                "stored composite sequence) cross-plotted and fitted, broken at logged surfaces "
                "(a hiatus makes a dog-leg), with each event's residual.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->x, "The hole (on the x axis against --with, on the y axis against "
                                    "the composite)")->required();
    auto* y = sub->add_option("--with", o->y, "The other hole (y axis)");
    auto* c = sub->add_flag("--composite", o->composite,
                            "Against the latest stored composite sequence (x axis: rank counted "
                            "from the youngest event, so it grows down-section like depth)");
    y->excludes(c);
    sub->add_option("--fit", o->fit,
                    "york: errors in both (brackets as uncertainty); rma: reduced major axis")
        ->check(CLI::IsMember({"york", "rma"}))
        ->capture_default_str();
    sub->add_option("--off-line-z", o->off_line_z,
                    "An event this many standard errors off the line is flagged")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub->add_flag("--no-breaks", o->no_breaks, "One line, not broken at logged surfaces");
    sub->add_option("--by", o->by, "point: every shared event; segment: every piece of the line")
        ->check(CLI::IsMember({"point", "segment"}))
        ->capture_default_str();
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    auto* plot = sub->add_option("--plot", o->plot,
                                 "Draw the cross-plot of --hole and --with to this .svg, .png or "
                                 ".pdf");
    plot->excludes(c);
    sub->add_flag("--plot-labels", o->plot_labels,
                  "Label every event in the plot (by default only those off the line)");
    addCorrelationOptions(*sub, o->correlation);
    return [o, &io]() {
        if (!o->plot.empty()) figureFormatOf(o->plot, "--plot");
        auto store = db::ProjectStore::open(o->project);
        const CorrelationData data = gatherCorrelationData(store.loadDataset(), o->correlation);
        LocSettings s;
        s.fit = o->fit == "rma" ? LocFit::ReducedMajorAxis : LocFit::York;
        s.off_line_z = o->off_line_z;
        s.break_at_surfaces = !o->no_breaks;
        LineOfCorrelation loc;
        if (o->composite) {
            loc = lineAgainstComposite(data, storedComposite(store, data), holeIndex(data, o->x), s);
        } else {
            if (o->y.empty())
                throw std::invalid_argument("give --with HOLE or --composite");
            loc = lineOfCorrelation(data, holeIndex(data, o->x), holeIndex(data, o->y), s);
        }
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        if (o->by == "segment") {
            TablePrinter t({{"segment", A::Right}, {"x_from_m", A::Right}, {"x_to_m", A::Right},
                            {"points", A::Right}, {"slope", A::Right}, {"slope_sd", A::Right},
                            {"intercept_m", A::Right}, {"intercept_sd_m", A::Right},
                            {"mswd", A::Right}});
            int n = 0;
            for (const LocSegment& g : loc.segments)
                t.addRow({std::to_string(++n), formatNumber(g.x_from_m, csv, 2),
                          formatNumber(g.x_to_m, csv, 2), std::to_string(g.points),
                          g.fitted ? formatNumber(g.slope, csv, 4) : "",
                          g.fitted ? formatNumber(g.slope_sd, csv, 4) : "",
                          g.fitted ? formatNumber(g.intercept_m, csv, 3) : "",
                          g.fitted ? formatNumber(g.intercept_sd_m, csv, 3) : "",
                          g.fitted && s.fit == LocFit::York ? formatNumber(g.mswd, csv, 2) : ""});
            t.print(io.out, csv);
        } else {
            TablePrinter t({{"event"}, {"x_m", A::Right}, {"x_sd_m", A::Right}, {"y_m", A::Right},
                            {"y_sd_m", A::Right}, {"residual_m", A::Right}, {"z", A::Right},
                            {"segment", A::Right}, {"off_line"}});
            for (const LocPoint& p : loc.points)
                t.addRow({data.events[p.event].id, formatNumber(p.x_m, csv, 2),
                          formatNumber(p.x_sd_m, csv, 2), formatNumber(p.y_m, csv, 2),
                          formatNumber(p.y_sd_m, csv, 2), formatNumber(p.residual_m, csv, 2),
                          formatNumber(p.z, csv, 2), std::to_string(p.segment + 1),
                          p.off_line ? "yes" : ""});
            t.print(io.out, csv);
        }
        if (!o->plot.empty()) {
            auto input = locPlotInput(loc, data, holeIndex(data, o->x), holeIndex(data, o->y));
            input.label_every_event = o->plot_labels;
            ensureGuiApplication();
            writeFigure(draw::layoutLocPlot(input), o->plot, "--plot",
                        "Line of correlation " + o->x + " - " + o->y, 200,
                        draw::PdfPageSize::FitChart);
            (csv ? io.err : io.out) << "drew the line of correlation to " << o->plot.string() << '\n';
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
