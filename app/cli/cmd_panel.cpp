// `panel`: the correlation panel drawn headless: one column per hole (core runs, lithology by
// texture, surfaces, samples; on request lanes of chosen taxa, zones, and an age track of dates
// and the age model), tie lines of chosen events and isochrons of chosen ages between
// the columns, on a depth, elevation or age axis, optionally flattened on one of them. The same
// layout the viewer shows.
#include "cli/age_list.hpp"
#include "cli/command.hpp"
#include "cli/figure_file.hpp"
#include "cli/gui_context.hpp"
#include "cli/panel_source.hpp"
#include "cli/run_cli.hpp"

#include "draw/panel_layout.hpp"

#include "atollog/db/project_store.hpp"

#include <chrono>
#include <ctime>
#include <filesystem>
#include <memory>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {

namespace {

std::string todayUtc() {
    const std::time_t now = std::chrono::system_clock::to_time_t(std::chrono::system_clock::now());
    std::tm tm{};
    gmtime_r(&now, &tm);
    char text[16];
    std::strftime(text, sizeof text, "%Y-%m-%d", &tm);
    return text;
}

/// The track words of --tracks, in the order a column draws them.
const std::vector<std::string> kTrackWords{"runs",  "lithology", "surfaces", "samples",
                                           "taxa",  "zones",     "dates",    "model"};

/// The column tracks named in a --tracks list. Throws std::invalid_argument naming a word that
/// is not a track, and the accepted ones.
draw::HoleColumnTracks tracksFromWords(const std::vector<std::string>& words) {
    draw::HoleColumnTracks t;
    t.core_runs = t.lithology = t.surfaces = t.samples = false;
    t.taxa = t.zones = t.dates = t.age_model = false;
    for (const std::string& w : words) {
        bool* flag = w == "runs"        ? &t.core_runs
                     : w == "lithology" ? &t.lithology
                     : w == "surfaces"  ? &t.surfaces
                     : w == "samples"   ? &t.samples
                     : w == "taxa"      ? &t.taxa
                     : w == "zones"     ? &t.zones
                     : w == "dates"     ? &t.dates
                     : w == "model"     ? &t.age_model
                                        : nullptr;
        if (!flag) {
            std::string accepted;
            for (const std::string& k : kTrackWords) accepted += (accepted.empty() ? "" : ",") + k;
            throw std::invalid_argument("--tracks: '" + w + "' is not a track; give a list of " +
                                        accepted);
        }
        *flag = true;
    }
    return t;
}

} // namespace

CommandRun addPanelCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        fs::path out;
        std::vector<std::string> holes;
        std::vector<std::string> events;
        std::string ages;
        std::string axis = "depth";
        double mm_per_myr = 0.0;
        std::string flatten;
        double scale = 500;
        double dpi = 150;
        std::string page = "fit";
        bool feet = false;
        std::vector<double> window;
        std::string date;
        std::vector<std::string> taxa;
        std::vector<std::string> tracks{"runs", "lithology", "surfaces", "samples", "taxa"};
        std::string zone_scheme;
        AgeModelOptions model;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "panel", "Draw the correlation panel (the holes side by side with their runs, lithology, "
                 "surfaces and samples; tie lines of chosen events and isochrons of chosen ages "
                 "between them) to an SVG, PNG or PDF file: what the viewer shows.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--out", o->out, "Output file: .svg, .png or .pdf")->required();
    sub->add_option("--holes", o->holes, "Holes left to right (default: all, by chain distance)")
        ->delimiter(',');
    sub->add_option("--events", o->events, "Events to tie between the columns")->delimiter(',');
    sub->add_option("--ages-ma", o->ages, "Isochrons of these ages (Ma), from the age models");
    sub->add_option("--axis", o->axis,
                    "Vertical axis: depth below each collar, elevation, or age (each column drawn "
                    "through its hole's age model, so equal ages stand level)")
        ->check(CLI::IsMember({"depth", "elevation", "age"}))
        ->capture_default_str();
    sub->add_option("--mm-per-myr", o->mm_per_myr,
                    "Age axis: paper per million years (default: as tall as the deepest hole at "
                    "--scale)")
        ->check(CLI::PositiveNumber);
    sub->add_option("--flatten", o->flatten,
                    "Flatten on this event (one of --events) or isochron (e.g. \"0.125 Ma\")");
    sub->add_option("--scale", o->scale, "Vertical scale 1:N (e.g. 500)")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub->add_option("--dpi", o->dpi, "Resolution of a PNG")->check(CLI::Range(30.0, 1200.0))
        ->capture_default_str();
    sub->add_option("--page", o->page, "PDF page: fit, a4, a3 or letter")
        ->check(CLI::IsMember({"fit", "a4", "a3", "letter"}))
        ->capture_default_str();
    sub->add_flag("--feet", o->feet, "Depth labels in feet");
    sub->add_option("--window", o->window,
                    "Only this part of the axis: TOP,BASE in m (in Ma on an age axis)")
        ->delimiter(',')
        ->expected(2);
    sub->add_option("--date", o->date, "Date for the title block (default: today, UTC)");
    sub->add_option("--taxa", o->taxa,
                    "A lane in every column for each of these taxa (ids, in this order): range "
                    "of counted finds, reworked and caved finds apart")
        ->delimiter(',');
    sub->add_option("--tracks", o->tracks,
                    "Column tracks to show, left to right: runs, lithology, surfaces, samples, "
                    "taxa (the --taxa lanes), zones, dates and model (an age track)")
        ->delimiter(',')
        ->capture_default_str();
    sub->add_option("--zone-scheme", o->zone_scheme,
                    "With the zones track: only this zonation scheme (default: every scheme)");
    addAgeModelOptions(*sub, o->model);
    return [o, &io]() {
        figureFormatOf(o->out, "--out"); // refuse a bad name before any work
        const draw::HoleColumnTracks tracks = tracksFromWords(o->tracks);
        if (!o->zone_scheme.empty() && !tracks.zones)
            throw std::invalid_argument("--zone-scheme needs the zones track: add zones to --tracks");
        const auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        PanelSourceOptions source;
        source.holes = o->holes;
        source.events = o->events;
        if (!o->ages.empty()) source.ages_ma = parseAgeList(o->ages, "--ages-ma");
        source.model = o->model;
        source.title = o->project.stem().string();
        source.tracks = tracks;
        if (tracks.taxa) source.taxa = o->taxa;
        source.zones = tracks.zones;
        source.zone_scheme = o->zone_scheme;
        source.dates = tracks.dates;
        // An age axis stands every column on its model, shown as a track or not.
        source.age_model = tracks.age_model || o->axis == "age";
        if (o->mm_per_myr > 0.0 && o->axis != "age")
            throw std::invalid_argument("--mm-per-myr sets the scale of an age axis: add --axis age "
                                        "or leave it out");
        io.progress("gathering columns, their tracks, ties and isochrons");
        const draw::PanelInput input = panelInputFromDataset(data, source);
        draw::PanelView view;
        view.axis = o->axis == "elevation" ? draw::PanelAxis::Elevation
                    : o->axis == "age"     ? draw::PanelAxis::Age
                                           : draw::PanelAxis::Depth;
        view.age_mm_per_myr = o->mm_per_myr;
        if (!o->flatten.empty()) view.flatten_on = o->flatten;
        view.scale_ratio = o->scale;
        view.depth_unit = o->feet ? draw::DepthUnit::Feet : draw::DepthUnit::Metres;
        if (o->window.size() == 2) {
            if (!(o->window[0] < o->window[1]))
                throw std::invalid_argument("--window: the top (" + std::to_string(o->window[0]) +
                                            ") must lie above the base (" +
                                            std::to_string(o->window[1]) + ")");
            view.window_top_m = o->window[0];
            view.window_base_m = o->window[1];
        }
        view.date_text = o->date.empty() ? todayUtc() : o->date;
        ensureGuiApplication();
        const draw::DisplayList list = draw::layoutPanel(input, view);
        const auto page = o->page == "a4"       ? draw::PdfPageSize::A4
                          : o->page == "a3"     ? draw::PdfPageSize::A3
                          : o->page == "letter" ? draw::PdfPageSize::Letter
                                                : draw::PdfPageSize::FitChart;
        writeFigure(list, o->out, "--out", "Correlation panel, " + source.title, o->dpi, page);
        io.out << "wrote " << o->out.string() << " (" << input.columns.size() << " holes, "
               << input.ties.size() << " tie lines, " << input.isochrons.size()
               << " isochrons)\n";
        return int(kOk);
    };
}

} // namespace atollog::cli
