#pragma once
// The invented fossil taxa of the demo, their true stratigraphic ranges, the time scale of their
// first and last appearances (events.csv) and two zonation schemes built on those events.
#include "atollog/engine/core_records.hpp"

#include <string>
#include <vector>

namespace atollog::demo {

struct TaxonPlan {
    std::string taxon; ///< id, e.g. CALC-OVA
    std::string name;  ///< invented binomial
    TaxonGroup group = TaxonGroup::Other;
    double first_ma = 0;    ///< true first appearance (older end of the range)
    double last_ma = 0;     ///< true last appearance; 0 = still living
    int abundance_rank = 2; ///< 1 rare, 2 few, 3 common, 4 abundant: how easily it is found
};

/// A first appearance at least this old lies below every cored reef: it is no event of the scale.
constexpr double kOlderThanAnyReefMa = 6.0;

std::vector<TaxonPlan> taxonCatalogue();

/// Base and top events of the catalogue, oldest first. Ages are the true range ends: the invented
/// time scale is exact, its sd says how well such a scale would be known.
std::vector<TimeScaleEvent> timeScaleEvents(const std::vector<TaxonPlan>& taxa);

/// Interval zones between successive events of the taxa of one group, oldest zone first; the
/// oldest zone is open at its base and the youngest open at its top.
std::vector<Zone> zonationScheme(const std::string& scheme, const std::string& code_prefix,
                                 TaxonGroup group, const std::vector<TaxonPlan>& taxa,
                                 const std::vector<TimeScaleEvent>& events);

std::string baseEventId(const std::string& taxon);
std::string topEventId(const std::string& taxon);

} // namespace atollog::demo
