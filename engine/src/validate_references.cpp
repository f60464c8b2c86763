// Every reference by id resolves: to holes, samples, taxa and events.
#include "atollog/engine/validation_detail.hpp"

#include <optional>

namespace atollog::detail {
namespace {

std::string_view trimmed(std::string_view s) {
    while (!s.empty() && s.front() == ' ')
        s.remove_prefix(1);
    while (!s.empty() && s.back() == ' ')
        s.remove_suffix(1);
    return s;
}

struct Target {
    const IdIndex &index;
    Table table;
    const char *what; // "hole", "sample", ...
};

/// Row of the referenced record, or nullopt after reporting the dangling reference. An empty
/// reference is left to validateIdentifiers.
std::optional<std::size_t> resolve(IssueList &out, Table table, std::size_t row, const char *column,
                                   std::string_view id, const Target &target,
                                   std::string_view context = {}) {
    if (id.empty())
        return std::nullopt;
    if (auto it = target.index.find(id); it != target.index.end())
        return it->second;
    std::string fix;
    if (std::string_view t = trimmed(id); t != id && target.index.count(t))
        fix = "write " + quoted(t) + " without the spaces";
    else
        fix = "add " + std::string(target.what) + " " + quoted(id) + " to " +
              std::string(tableFileName(target.table)) + " or correct the id";
    out.error(table, row, column, std::string(id),
              std::string(target.what) + " " + quoted(id) + std::string(context) + " is not in " +
                  std::string(tableFileName(target.table)),
              std::move(fix));
    return std::nullopt;
}

} // namespace

void validateReferences(const CoreDataset &data, const DatasetIndex &index, IssueList &out) {
    const Target hole{index.holes, Table::Holes, "hole"};
    const Target sample{index.samples, Table::Samples, "sample"};
    const Target taxon{index.taxa, Table::Taxa, "taxon"};
    const Target event{index.events, Table::Events, "event"};

    for (std::size_t i = 0; i < data.runs.size(); ++i)
        resolve(out, Table::Runs, i, "hole", data.runs[i].hole, hole,
                " of run " + quoted(data.runs[i].run));
    for (std::size_t i = 0; i < data.intervals.size(); ++i)
        resolve(out, Table::Intervals, i, "hole", data.intervals[i].hole, hole);
    for (std::size_t i = 0; i < data.samples.size(); ++i)
        resolve(out, Table::Samples, i, "hole", data.samples[i].hole, hole,
                " of sample " + quoted(data.samples[i].sample));
    for (std::size_t i = 0; i < data.occurrences.size(); ++i) {
        resolve(out, Table::Occurrences, i, "sample", data.occurrences[i].sample, sample);
        resolve(out, Table::Occurrences, i, "taxon", data.occurrences[i].taxon, taxon);
    }
    for (std::size_t i = 0; i < data.events.size(); ++i)
        resolve(out, Table::Events, i, "taxon", data.events[i].taxon, taxon,
                " of event " + quoted(data.events[i].event));
    for (std::size_t i = 0; i < data.dates.size(); ++i) {
        const NumericalDate &d = data.dates[i];
        resolve(out, Table::Dates, i, "hole", d.hole, hole);
        if (!d.sample || d.sample->empty())
            continue;
        const auto s = resolve(out, Table::Dates, i, "sample", *d.sample, sample);
        if (!s || d.hole.empty())
            continue;
        const Sample &dated = data.samples[*s];
        if (dated.hole != d.hole)
            out.error(Table::Dates, i, "sample", *d.sample,
                      "sample " + quoted(*d.sample) + " belongs to hole " + quoted(dated.hole) +
                          ", but the date is given for hole " + quoted(d.hole),
                      "set hole to " + quoted(dated.hole) + " or name a sample of hole " +
                          quoted(d.hole));
    }
    for (std::size_t i = 0; i < data.zones.size(); ++i) {
        const Zone &z = data.zones[i];
        if (z.base_event)
            resolve(out, Table::Zones, i, "base_event", *z.base_event, event,
                    " (base of zone " + quoted(z.zone) + ")");
        if (z.top_event)
            resolve(out, Table::Zones, i, "top_event", *z.top_event, event,
                    " (top of zone " + quoted(z.zone) + ")");
    }
}

} // namespace atollog::detail
