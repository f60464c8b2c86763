#include "cli/datum_run.hpp"

#include "cli/hole_filter.hpp"

#include "atollog/db/tie_point_store.hpp"

#include <algorithm>
#include <map>
#include <utility>
#include <vector>

namespace atollog::cli {
namespace {

using A = TablePrinter::Align;

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

} // namespace

BiostratResult pickDatums(const CoreDataset& data, const BiostratOptions& options,
                          const PhaseReport& phase) {
    const auto settings = options.settings();
    reportPhase(phase, "picking datums");
    return runBiostratigraphy(data, settings);
}

std::string bracketEndCell(double value_m, bool open, bool csv) {
    return open ? (csv ? "" : "open") : formatNumber(value_m, csv, 2);
}

TablePrinter datumTable(const BiostratResult& result, const DatumTableChoice& choice, bool csv) {
    std::map<std::pair<std::string, std::string>, const TiePoint*> tieOf;
    for (const auto& t : result.ties) tieOf[{t.hole, t.event}] = &t;

    TablePrinter table({{"hole"}, {"event"}, {"kind"}, {"taxon"}, {"depth_m", A::Right},
                        {"plus_minus_m", A::Right}, {"shallow_m", A::Right},
                        {"deep_m", A::Right}, {"ext_shallow_m", A::Right},
                        {"ext_deep_m", A::Right}, {"found_sample"}, {"absent_sample"},
                        {"horizons", A::Right}, {"age_ma", A::Right},
                        {"age_sd_ma", A::Right}, {"flags"}});
    for (const auto& p : result.picks) {
        if (!wantedHole(choice.hole, p.hole) || (!p.found && !choice.all)) continue;
        const auto it = tieOf.find({p.hole, p.event});
        const TiePoint* tie = it == tieOf.end() ? nullptr : it->second;
        const bool extended = p.extension_fraction.has_value();
        table.addRow(
            {p.hole, p.event, std::string(toString(p.kind)), p.taxon,
             p.found ? formatNumber(p.depth_m, csv, 2) : "",
             p.found && p.half_width_m ? formatNumber(*p.half_width_m, csv, 2) : "",
             p.found ? bracketEndCell(p.widened.shallow_m, p.widened.open_shallow, csv) : "",
             p.found ? bracketEndCell(p.widened.deep_m, p.widened.open_deep, csv) : "",
             p.found && extended ? bracketEndCell(p.extended.shallow_m, p.extended.open_shallow, csv) : "",
             p.found && extended ? bracketEndCell(p.extended.deep_m, p.extended.open_deep, csv) : "",
             p.found_sample, p.absent_sample.value_or(""),
             p.found ? std::to_string(p.horizon_count) : "",
             formatNumber(p.age_ma, csv, 3), formatNumber(p.age_sd_ma, csv, 3),
             pickFlags(p, tie)});
    }
    return table;
}

std::string datumRunSummary(const BiostratResult& result) {
    return std::to_string(result.ties.size()) + " tie points from " +
           std::to_string(result.picks.size()) + " picks; " +
           std::to_string(result.conflicts.size()) + " conflicts";
}

db::ModelRunRecord datumRunRecord(const CoreDataset& data, const BiostratOptions& options) {
    db::ModelRunRecord run;
    run.kind = "datums";
    run.settings = biostratSettingsText(options.settings());
    run.inputs_sha256 = db::ProjectStore::datasetHash(data);
    return run;
}

StoredRunOutcome storeDatumRun(db::ProjectStore& store, const CoreDataset& data,
                               const BiostratOptions& options, const BiostratResult& result,
                               const PhaseReport& phase) {
    reportPhase(phase, "storing the tie points with their provenance");
    db::ModelRunRecord run = datumRunRecord(data, options);
    // Unless the latest stored set came from the same data and settings.
    if (const auto same = db::sameLatestRun(store, run)) return {same->id, true};
    run.summary = datumRunSummary(result);
    return {db::storeTiePoints(store, run, result.ties), false};
}

std::string datumStoreNote(const StoredRunOutcome& outcome, const BiostratResult& result) {
    if (outcome.unchanged) return "tie points unchanged since run #" + std::to_string(outcome.run_id);
    return "stored " + std::to_string(result.ties.size()) + " tie points as run #" +
           std::to_string(outcome.run_id);
}

} // namespace atollog::cli
