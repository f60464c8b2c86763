// Sub-commands of the biostratigraphy: ranges, datums (with stored tie points), zones.
#include "cli/biostrat_options.hpp"
#include "cli/command.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"
#include "atollog/engine/biostrat_run.hpp"

#include <filesystem>
#include <map>
#include <memory>
#include <ostream>
#include <set>
#include <stdexcept>

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

void requireHole(const CoreDataset& data, const std::string& hole) {
    if (hole.empty()) return;
    for (const auto& h : data.holes)
        if (h.hole == hole) return;
    std::string known;
    for (const auto& h : data.holes) known += (known.empty() ? "" : ", ") + h.hole;
    throw std::invalid_argument("no hole '" + hole + "' in the project; holes are: " + known);
}

bool wanted(const std::string& filter, const std::string& hole) {
    return filter.empty() || filter == hole;
}

std::string bracketEnd(double value_m, bool open, bool csv) {
    return open ? (csv ? "" : "open") : formatNumber(value_m, csv, 2);
}

/// Flags of a pick for people and programs, ';'-separated: the pick's own, then what the tie
/// point adds (conflicts, surfaces), then whether it became a tie at all.
std::string pickFlags(const DatumPick& p, const TiePoint* tie) {
    std::vector<std::string> flags;
    if (!p.found) return "not_found";
    if (p.plain.open_shallow) flags.push_back("open_shallow");
    if (p.plain.open_deep) flags.push_back("open_deep");
    if (p.widened_by_recovery) flags.push_back("widened_by_recovery");
    if (p.extension_undefined) flags.push_back("extension_undefined");
    if (p.unreliable_cuttings_base) flags.push_back("cuttings_base_unreliable");
    if (tie) {
        for (const auto& f : tie->flags)
            if (std::find(flags.begin(), flags.end(), f) == flags.end() &&
                f != "cuttings_base" && f != "extension_undefined" && f != "widened_by_recovery")
                flags.push_back(f);
    } else {
        flags.push_back("no_tie");
    }
    std::string text;
    for (const auto& f : flags) text += (text.empty() ? "" : ";") + f;
    return text;
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
            if (!wanted(o->hole, r.hole)) continue;
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
        const auto settings = o->biostrat.settings();
        io.progress("picking datums");
        const BiostratResult result = runBiostratigraphy(loaded.data, settings);

        std::map<std::pair<std::string, std::string>, const TiePoint*> tieOf;
        for (const auto& t : result.ties) tieOf[{t.hole, t.event}] = &t;

        const bool csv = o->csv;
        TablePrinter table({{"hole"}, {"event"}, {"kind"}, {"taxon"}, {"depth_m", A::Right},
                            {"plus_minus_m", A::Right}, {"shallow_m", A::Right},
                            {"deep_m", A::Right}, {"ext_shallow_m", A::Right},
                            {"ext_deep_m", A::Right}, {"found_sample"}, {"absent_sample"},
                            {"horizons", A::Right}, {"age_ma", A::Right},
                            {"age_sd_ma", A::Right}, {"flags"}});
        for (const auto& p : result.picks) {
            if (!wanted(o->hole, p.hole) || (!p.found && !o->all)) continue;
            const auto it = tieOf.find({p.hole, p.event});
            const TiePoint* tie = it == tieOf.end() ? nullptr : it->second;
            const bool extended = p.extension_fraction.has_value();
            table.addRow(
                {p.hole, p.event, std::string(toString(p.kind)), p.taxon,
                 p.found ? formatNumber(p.depth_m, csv, 2) : "",
                 p.found && p.half_width_m ? formatNumber(*p.half_width_m, csv, 2) : "",
                 p.found ? bracketEnd(p.widened.shallow_m, p.widened.open_shallow, csv) : "",
                 p.found ? bracketEnd(p.widened.deep_m, p.widened.open_deep, csv) : "",
                 p.found && extended ? bracketEnd(p.extended.shallow_m, p.extended.open_shallow, csv) : "",
                 p.found && extended ? bracketEnd(p.extended.deep_m, p.extended.open_deep, csv) : "",
                 p.found_sample, p.absent_sample.value_or(""),
                 p.found ? std::to_string(p.horizon_count) : "",
                 formatNumber(p.age_ma, csv, 3), formatNumber(p.age_sd_ma, csv, 3),
                 pickFlags(p, tie)});
        }
        table.print(io.out, csv);

        if (o->no_store) return int(kOk);
        // Store the tie points unless the latest stored set came from the same data and settings.
        db::ModelRunRecord run;
        run.kind = "datums";
        run.settings = biostratSettingsText(settings);
        run.inputs_sha256 = db::ProjectStore::datasetHash(loaded.data);
        std::ostream& note = csv ? io.err : io.out;
        if (const auto same = db::sameLatestRun(loaded.store, run)) {
            note << "tie points unchanged since run #" << same->id << '\n';
            return int(kOk);
        }
        run.summary = std::to_string(result.ties.size()) + " tie points from " +
                      std::to_string(result.picks.size()) + " picks; " +
                      std::to_string(result.conflicts.size()) + " conflicts";
        const auto id = db::storeTiePoints(loaded.store, run, result.ties);
        note << "stored " << result.ties.size() << " tie points as run #" << id << '\n';
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
        if (!o->scheme.empty()) {
            std::set<std::string> schemes;
            for (const auto& z : loaded.data.zones) schemes.insert(z.scheme);
            if (!schemes.count(o->scheme))
                throw std::invalid_argument("no zonation scheme '" + o->scheme + "' in zones.csv");
        }
        const BiostratResult result = runBiostratigraphy(loaded.data, o->biostrat.settings());
        const bool csv = o->csv;
        auto keep = [&](const std::string& scheme, const std::string& hole) {
            return wanted(o->hole, hole) && (o->scheme.empty() || scheme.empty() || scheme == o->scheme);
        };

        if (o->by == "sample") {
            TablePrinter table({{"scheme"}, {"hole"}, {"sample"}, {"depth_m", A::Right}, {"zone"},
                                {"call"}, {"reason"}});
            for (const auto& c : result.zones.samples)
                if (keep(c.scheme, c.hole))
                    table.addRow({c.scheme, c.hole, c.sample, formatNumber(c.depth_m, csv, 2),
                                  c.zone.value_or(""), std::string(toString(c.call)), c.reason});
            table.print(io.out, csv);
        } else if (o->by == "interval") {
            // Consecutive samples with the same call and zone make one interval.
            TablePrinter table({{"scheme"}, {"hole"}, {"zone"}, {"top_m", A::Right},
                                {"base_m", A::Right}, {"samples", A::Right}, {"call"}});
            const auto& calls = result.zones.samples;
            for (std::size_t i = 0; i < calls.size();) {
                std::size_t j = i + 1;
                while (j < calls.size() && calls[j].scheme == calls[i].scheme &&
                       calls[j].hole == calls[i].hole && calls[j].call == calls[i].call &&
                       calls[j].zone == calls[i].zone)
                    ++j;
                if (keep(calls[i].scheme, calls[i].hole))
                    table.addRow({calls[i].scheme, calls[i].hole, calls[i].zone.value_or("-"),
                                  formatNumber(calls[i].depth_m, csv, 2),
                                  formatNumber(calls[j - 1].depth_m, csv, 2),
                                  std::to_string(j - i), std::string(toString(calls[i].call))});
                i = j;
            }
            table.print(io.out, csv);
        } else if (o->by == "boundary") {
            TablePrinter table({{"scheme"}, {"zone"}, {"edge"}, {"event"}, {"hole"},
                                {"depth_m", A::Right}, {"shallow_m", A::Right},
                                {"deep_m", A::Right}, {"flags"}});
            for (const auto& b : result.zones.boundaries) {
                if (!keep(b.scheme, b.hole)) continue;
                std::string flags = b.picked ? "" : "not_picked";
                if (b.open_ended) flags += std::string(flags.empty() ? "" : ";") + "open_ended";
                if (b.unreliable_cuttings_base)
                    flags += std::string(flags.empty() ? "" : ";") + "cuttings_base_unreliable";
                table.addRow({b.scheme, b.zone, b.edge == ZoneEdge::Base ? "base" : "top", b.event,
                              b.hole, b.picked ? formatNumber(b.depth_m, csv, 2) : "",
                              b.picked ? bracketEnd(b.widened.shallow_m, b.widened.open_shallow, csv) : "",
                              b.picked ? bracketEnd(b.widened.deep_m, b.widened.open_deep, csv) : "",
                              flags});
            }
            table.print(io.out, csv);
        } else {
            TablePrinter table({{"kind"}, {"hole"}, {"scheme"}, {"zone"}, {"deeper_event"},
                                {"shallower_event"}, {"age_gap_ma", A::Right},
                                {"tolerance_ma", A::Right}, {"message"}});
            const auto& list = o->by == "conflict" ? result.conflicts : result.explained_conflicts;
            for (const auto& c : list) {
                if (!keep(c.scheme, c.hole)) continue;
                const bool order = c.kind == PickConflictKind::EventOrder;
                table.addRow({order ? "event_order" : "zone_inverted", c.hole, c.scheme, c.zone,
                              c.expected_deeper_event, c.expected_shallower_event,
                              order ? formatNumber(c.age_gap_ma, csv, 3) : "",
                              order ? formatNumber(c.tolerance_ma, csv, 3) : "", c.message});
            }
            table.print(io.out, csv);
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
