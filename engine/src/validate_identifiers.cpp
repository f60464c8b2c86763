// Ids and required text: present, without leading/trailing spaces, and ids unique in their table.
#include "atollog/engine/validation_detail.hpp"

#include <functional>
#include <string>

namespace atollog::detail {
namespace {

bool isSpace(char c) {
    return c == ' ' || c == '\t' || c == '\r' || c == '\n';
}

bool blank(std::string_view s) {
    for (char c : s)
        if (!isSpace(c))
            return false;
    return true;
}

std::string_view trimmed(std::string_view s) {
    while (!s.empty() && isSpace(s.front()))
        s.remove_prefix(1);
    while (!s.empty() && isSpace(s.back()))
        s.remove_suffix(1);
    return s;
}

/// Reports an empty required cell; returns false when it was empty.
bool requireText(IssueList &out, Table table, std::size_t row, const char *column,
                 std::string_view text, std::string_view what) {
    if (!blank(text))
        return true;
    out.error(table, row, column, std::string(text),
              std::string(column) + " is empty; every " + std::string(tableName(table)) +
                  " row needs " + std::string(what),
              "fill in " + std::string(column) + " or delete the row");
    return false;
}

void requireNoEdgeSpaces(IssueList &out, Table table, std::size_t row, const char *column,
                         std::string_view id) {
    if (blank(id) || trimmed(id) == id)
        return;
    out.error(table, row, column, std::string(id),
              std::string(column) + " " + quoted(id) + " has leading or trailing spaces",
              "write it as " + quoted(trimmed(id)) + " (ids are matched exactly)");
}

/// A required id: present, no edge spaces.
void requireId(IssueList &out, Table table, std::size_t row, const char *column,
               std::string_view id, std::string_view what) {
    if (requireText(out, table, row, column, id, what))
        requireNoEdgeSpaces(out, table, row, column, id);
}

/// Reports every row whose id already appeared in an earlier row of the same table.
template <class Rows, class KeyOf, class Label>
void requireUnique(IssueList &out, Table table, const Rows &rows, const char *column, KeyOf key_of,
                   Label label_of) {
    std::unordered_map<std::string, std::size_t> first_row;
    first_row.reserve(rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        std::string key = key_of(rows[i]);
        if (key.empty())
            continue; // reported as empty
        auto [it, inserted] = first_row.try_emplace(std::move(key), i);
        if (inserted)
            continue;
        const std::string label = label_of(rows[i]);
        out.error(table, i, column, label,
                  std::string(column) + " " + quoted(label) + " is already used in data row " +
                      std::to_string(it->second + 1) + " of " + std::string(tableFileName(table)),
                  "give each row its own " + std::string(column) + ", or merge the two rows");
    }
}

} // namespace

void validateIdentifiers(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.holes.size(); ++i) {
        requireId(out, Table::Holes, i, "hole", data.holes[i].hole, "a hole id");
        requireText(out, Table::Holes, i, "site", data.holes[i].site, "a site");
    }
    for (std::size_t i = 0; i < data.runs.size(); ++i) {
        requireText(out, Table::Runs, i, "hole", data.runs[i].hole, "the hole it was cored in");
        requireId(out, Table::Runs, i, "run", data.runs[i].run, "a run id");
    }
    for (std::size_t i = 0; i < data.intervals.size(); ++i)
        requireText(out, Table::Intervals, i, "hole", data.intervals[i].hole,
                    "the hole it was logged in");
    for (std::size_t i = 0; i < data.samples.size(); ++i) {
        requireText(out, Table::Samples, i, "hole", data.samples[i].hole,
                    "the hole it was taken from");
        requireId(out, Table::Samples, i, "sample", data.samples[i].sample, "a sample id");
    }
    for (std::size_t i = 0; i < data.taxa.size(); ++i) {
        requireId(out, Table::Taxa, i, "taxon", data.taxa[i].taxon, "a taxon id");
        requireText(out, Table::Taxa, i, "name", data.taxa[i].name, "a taxon name");
    }
    for (std::size_t i = 0; i < data.occurrences.size(); ++i) {
        requireText(out, Table::Occurrences, i, "sample", data.occurrences[i].sample,
                    "the sample the taxon was seen in");
        requireText(out, Table::Occurrences, i, "taxon", data.occurrences[i].taxon,
                    "the taxon seen");
    }
    for (std::size_t i = 0; i < data.events.size(); ++i) {
        requireId(out, Table::Events, i, "event", data.events[i].event, "an event id");
        requireText(out, Table::Events, i, "taxon", data.events[i].taxon,
                    "the taxon whose base or top it dates");
    }
    for (std::size_t i = 0; i < data.dates.size(); ++i)
        requireText(out, Table::Dates, i, "hole", data.dates[i].hole, "the hole it dates");
    for (std::size_t i = 0; i < data.zones.size(); ++i) {
        requireId(out, Table::Zones, i, "scheme", data.zones[i].scheme, "a zonal scheme");
        requireId(out, Table::Zones, i, "zone", data.zones[i].zone, "a zone name");
    }

    const auto hole_id = [](const Hole &h) { return h.hole; };
    requireUnique(out, Table::Holes, data.holes, "hole", hole_id, hole_id);
    const auto run_id = [](const CoreRun &r) { return r.run; };
    requireUnique(out, Table::Runs, data.runs, "run", run_id, run_id);
    const auto sample_id = [](const Sample &s) { return s.sample; };
    requireUnique(out, Table::Samples, data.samples, "sample", sample_id, sample_id);
    const auto taxon_id = [](const Taxon &t) { return t.taxon; };
    requireUnique(out, Table::Taxa, data.taxa, "taxon", taxon_id, taxon_id);
    const auto event_id = [](const TimeScaleEvent &e) { return e.event; };
    requireUnique(out, Table::Events, data.events, "event", event_id, event_id);
    // (scheme, zone) is the key; the length prefix keeps "ab"+"c" apart from "a"+"bc".
    requireUnique(
        out, Table::Zones, data.zones, "zone",
        [](const Zone &z) {
            return z.scheme.empty() || z.zone.empty()
                       ? std::string{}
                       : std::to_string(z.scheme.size()) + ':' + z.scheme + z.zone;
        },
        [](const Zone &z) { return z.scheme + "/" + z.zone; });
}

} // namespace atollog::detail
