// Sub-commands of the biostratigraphy: ranges, datums (with stored tie points), zones.
#include "cli/biostrat_options.hpp"
#include "cli/command.hpp"
#include "cli/datum_run.hpp"
#include "cli/hole_filter.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"
#include "cli/zone_run.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/biostrat_run.hpp"

#include <filesystem>
#include <map>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

using A = TablePrinter::Align;

struct CommonOptions {
    fs::path project;
    std::string hole;
    bool csv = false;
    BiostratOptions biostrat;
};

CLI::App* addCommon(CLI::App& app, const char* name, const char* help, CommonOptions& o) {
    auto* sub = app.add_subcommand(name, help);
    sub->add_option("project", o.project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o.hole, "Only this hole");
    sub->add_flag("--csv", o.csv, "Print CSV instead of an aligned table");
    addBiostratOptions(*sub, o.biostrat);
    return sub;
}

struct Loaded {
    db::ProjectStore store;
    CoreDataset data;
};

Loaded load(const CommonOptions& o, const CommandIo& io) {
    io.progress("reading " + o.project.string());
    auto store = db::ProjectStore::open(o.project);
    CoreDataset data = store.loadDataset();
    requireHole(data, o.hole);
    return {std::move(store), std::move(data)};
}

} // namespace

CommandRun addRangesCommand(CLI::App& app, const CommandIo& io) {
    auto o = std::make_shared<CommonOptions>();
    addCommon(app, "ranges",
              "Observed range of every taxon in every hole: highest and lowest in-place "
              "occurrence; reworked and caved finds are counted but not used.",
              *o);
    return [o, &io]() {
        const auto loaded = load(*o, io);
        const auto settings = o->biostrat.settings();
        const auto ranges = observeRanges(loaded.data, settings);
        std::map<std::string, const Taxon*> taxa;
        for (const auto& t : loaded.data.taxa) taxa[t.taxon] = &t;

        TablePrinter table({{"hole"}, {"taxon"}, {"name"}, {"group"}, {"highest_sample"},
                            {"highest_m", A::Right}, {"lowest_sample"}, {"lowest_m", A::Right},
                            {"range_m", A::Right}, {"horizons", A::Right},
                            {"reworked", A::Right}, {"caved", A::Right}});
        for (const auto& r : ranges) {
            if (!wantedHole(o->hole, r.hole)) continue;
            const Taxon* t = taxa.count(r.taxon) ? taxa[r.taxon] : nullptr;
            table.addRow({r.hole, r.taxon, t ? t->name : "", t ? std::string(toString(t->group)) : "",
                          r.highest ? r.highest->sample : "",
                          r.highest ? formatNumber(r.highest->top_m, o->csv, 2) : "",
                          r.lowest ? r.lowest->sample : "",
                          r.lowest ? formatNumber(r.lowest->top_m, o->csv, 2) : "",
                          formatNumber(r.length_m(), o->csv, 2), std::to_string(r.horizon_count),
                          std::to_string(r.reworked.size()), std::to_string(r.caved.size())});
        }
        table.print(io.out, o->csv);
        return int(kOk);
    };
}

CommandRun addDatumsCommand(CLI::App& app, const CommandIo& io) {
    struct Options : CommonOptions {
        bool all = false;
        bool no_store = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = addCommon(
        app, "datums",
        "Datum picks: for every time-scale event found in a hole, the depth bracket between the "
        "last sample with the taxon and the next examined sample without it, widened for partial "
        "recovery, with the event's age. Usable picks are stored as tie points for age models.",
        *o);
    sub->add_flag("--all", o->all, "Also list events whose taxon is not found in a hole");
    sub->add_flag("--no-store", o->no_store, "Do not store the tie points in the project");
    return [o, &io]() {
        auto loaded = load(*o, io);
        const PhaseReport phase = [&io](const std::string& text) {
            io.progress(text);
            return true;
        };
        const BiostratResult result = pickDatums(loaded.data, o->biostrat, phase);
        datumTable(result, {o->hole, o->all}, o->csv).print(io.out, o->csv);
        if (o->no_store) return int(kOk);
        const auto outcome = storeDatumRun(loaded.store, loaded.data, o->biostrat, result);
        (o->csv ? io.err : io.out) << datumStoreNote(outcome, result) << '\n';
        return int(kOk);
    };
}

CommandRun addZonesCommand(CLI::App& app, const CommandIo& io) {
    struct Options : CommonOptions {
        std::string scheme;
        std::string by = "interval";
    };
    auto o = std::make_shared<Options>();
    auto* sub = addCommon(
        app, "zones",
        "Biozones of every scheme in every hole: the zone of each sample (or why it cannot be "
        "given), zone boundary brackets, and conflicting picks.",
        *o);
    sub->add_option("--scheme", o->scheme, "Only this zonation scheme");
    sub->add_option("--by", o->by,
                    "interval: runs of samples in one zone; sample: every sample; boundary: "
                    "every zone boundary's bracket; conflict: picks that contradict the zones "
                    "or the time scale; explained: inversions a logged hiatus surface or the "
                    "volcanic basement accounts for")
        ->check(CLI::IsMember({"interval", "sample", "boundary", "conflict", "explained"}))
        ->capture_default_str();
    return [o, &io]() {
        const auto loaded = load(*o, io);
        requireScheme(loaded.data, o->scheme);
        const BiostratResult result = assignZonesOf(loaded.data, o->biostrat);
        zoneTable(result, {o->hole, o->scheme, o->by}, o->csv).print(io.out, o->csv);
        return int(kOk);
    };
}

} // namespace atollog::cli
