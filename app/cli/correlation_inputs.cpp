#include "cli/correlation_inputs.hpp"

#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/correlation_data_from.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/logged_surfaces.hpp"

#include <stdexcept>

namespace atollog::cli {

std::string CorrelationOptions::settingsText() const {
    return "correlation.dates=" + std::string(no_dates ? "no" : "yes") + "\n" +
           biostratSettingsText(biostrat.settings()) + dates.settingsText();
}

void addCorrelationOptions(CLI::App& sub, CorrelationOptions& o) {
    addBiostratOptions(sub, o.biostrat);
    addDateOptions(sub, o.dates);
    sub.add_flag("--no-dates", o.no_dates,
                 "Leave the numerical dates out (only bases and tops of taxa)");
}

CorrelationData gatherCorrelationData(const CoreDataset& data, const CorrelationOptions& o) {
    const BiostratSettings bs = o.biostrat.settings();
    const BiostratResult bio = runBiostratigraphy(data, bs);
    std::vector<DateAge> dates;
    if (!o.no_dates)
        dates = computeDateAges(data, o.dates.settings());
    CorrelationDataOptions co;
    co.use_extended_brackets = bs.ties_use_extended_bracket;
    co.include_dates = !o.no_dates;
    return correlationDataFrom(data, bio.picks, dates, loggedSurfaces(data), co);
}

namespace {

template <class Get>
std::size_t indexOf(const std::vector<Get>& items, const std::string& wanted, const char* what,
                    std::string (*id)(const Get&)) {
    std::string known;
    for (std::size_t i = 0; i < items.size(); ++i) {
        if (id(items[i]) == wanted)
            return i;
        if (i < 40)
            known += (known.empty() ? "" : ", ") + id(items[i]);
    }
    if (items.size() > 40)
        known += ", ...";
    throw std::invalid_argument("no " + std::string(what) + " '" + wanted +
                                "' among the correlated ones: " + known);
}

} // namespace

std::size_t holeIndex(const CorrelationData& data, const std::string& hole) {
    return indexOf<std::string>(data.holes, hole, "hole",
                                [](const std::string& h) { return h; });
}

std::size_t eventIndex(const CorrelationData& data, const std::string& event) {
    return indexOf<SequenceEvent>(data.events, event, "event",
                                  [](const SequenceEvent& e) { return e.id; });
}

std::string kindWord(SequenceEventKind kind) {
    switch (kind) {
    case SequenceEventKind::Base: return "base";
    case SequenceEventKind::Top: return "top";
    case SequenceEventKind::Dated: return "dated";
    }
    return "dated";
}

} // namespace atollog::cli
