// Occurrences: counts are not negative, and a taxon is listed once per sample and status.
// Sized for a million rows: ids are interned once, then (sample, taxon, status) keys are sorted.
#include "atollog/engine/validation_detail.hpp"

#include <algorithm>
#include <cstdint>
#include <variant>

namespace atollog::detail {
namespace {

class Interner {
  public:
    explicit Interner(std::size_t expected) { ids_.reserve(expected); }
    std::uint64_t operator()(std::string_view s) {
        return ids_.try_emplace(s, static_cast<std::uint64_t>(ids_.size())).first->second;
    }

  private:
    std::unordered_map<std::string_view, std::uint64_t> ids_;
};

} // namespace

void validateOccurrences(const CoreDataset &data, IssueList &out) {
    const auto &rows = data.occurrences;
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const Occurrence &o = rows[i];
        if (!o.abundance)
            continue;
        if (const auto *count = std::get_if<std::int64_t>(&*o.abundance); count && *count < 0)
            out.error(Table::Occurrences, i, "abundance", std::to_string(*count),
                      // Named as the row edits name the row (status included: one taxon may
                      // be logged in place and reworked in one sample), so an edit's refusal
                      // gives the name once.
                      "taxon " + quoted(o.taxon) + " (" + std::string(toString(o.status)) +
                          ") in sample " + quoted(o.sample) + ": count " +
                          std::to_string(*count) + " is negative",
                      "give a whole count of 0 or more, or an abundance word");
    }

    // Key: sample (30 bits), taxon (30 bits), status (2 bits); then the row. Sorting keeps the
    // first row of each key first, so later rows are the ones reported.
    Interner samples(rows.size() / 8 + 16), taxa(1024);
    std::vector<std::pair<std::uint64_t, std::size_t>> keys;
    keys.reserve(rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const std::uint64_t key = (samples(rows[i].sample) << 32) | (taxa(rows[i].taxon) << 2) |
                                  static_cast<std::uint64_t>(rows[i].status);
        keys.emplace_back(key, i);
    }
    std::sort(keys.begin(), keys.end());
    std::size_t first = 0;
    for (std::size_t k = 1; k < keys.size(); ++k) {
        if (keys[k].first != keys[first].first) {
            first = k;
            continue;
        }
        const Occurrence &o = rows[keys[k].second];
        const std::string status(toString(o.status));
        out.error(Table::Occurrences, keys[k].second, "taxon", o.taxon,
                  "taxon " + quoted(o.taxon) + " (" + status + ") in sample " + quoted(o.sample) +
                      " is already listed in data row " + std::to_string(keys[first].second + 1),
                  "list each taxon once per sample and status; merge the two rows");
    }
}

} // namespace atollog::detail
