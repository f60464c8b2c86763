#include "taxon_catalogue.hpp"

#include "rounding.hpp"

#include <algorithm>

namespace atollog::demo {
namespace {

TaxonPlan taxon(std::string id, std::string name, TaxonGroup g, double first_ma, double last_ma,
                int rank) {
    return {std::move(id), std::move(name), g, first_ma, last_ma, rank};
}

} // namespace

std::string baseEventId(const std::string& taxon) { return "B " + taxon; }
std::string topEventId(const std::string& taxon) { return "T " + taxon; }

// Genus names are built on the invented island names (vess-, kalv-, torm-, ossi-, pelv-) so that
// none can be mistaken for a real genus. Ranges are chosen so that every hole has several range
// ends inside its cored packages (and some inside its hiatuses, which a model must not find).
std::vector<TaxonPlan> taxonCatalogue() {
    using G = TaxonGroup;
    const double old = 7.5;
    return {
        taxon("PORO-VAS", "Porolita vastensis", G::Coral, old, 0, 3),
        taxon("VACR-RAM", "Vessacropa ramulosa", G::Coral, 2.10, 0, 4),
        taxon("KALV-HEX", "Kalvastrea hexagona", G::Coral, 3.60, 0.95, 3),
        taxon("TORM-TEN", "Tormuphyllia tenuis", G::Coral, 1.85, 0.28, 2),
        taxon("OSSP-BRE", "Ossipora brevis", G::Coral, 0.62, 0, 3),
        taxon("PELV-LOB", "Pelvastrella lobata", G::Coral, old, 2.45, 2),
        taxon("MARG-OSS", "Marginvessa ossirensis", G::LargerBenthicForam, 1.20, 0, 4),
        taxon("CYKA-VAS", "Cyclokalva vastica", G::LargerBenthicForam, 4.50, 3.05, 3),
        taxon("LEPT-TEN", "Lepidotorma tenuimura", G::LargerBenthicForam, 3.90, 1.62, 3),
        taxon("AMPV-LAT", "Amphivessa latens", G::LargerBenthicForam, 0.33, 0, 3),
        taxon("OPKA-GRA", "Operkalvina grandis", G::LargerBenthicForam, 2.60, 0.52, 2),
        taxon("ALVO-MIN", "Alveossira minuta", G::LargerBenthicForam, 0.78, 0.16, 1),
        taxon("ELPV-COS", "Elphivessa costata", G::BenthicForam, old, 0, 4),
        taxon("ROTK-NOD", "Rotalkalva nodosa", G::BenthicForam, 1.45, 0.22, 2),
        taxon("TEXT-ASP", "Textormula aspera", G::BenthicForam, 3.20, 0, 3),
        taxon("QUIV-TAR", "Quinquevessa tardiva", G::BenthicForam, 0.24, 0, 2),
        taxon("GLOP-PRI", "Globopelva primaria", G::PlanktonicForam, old, 2.95, 1),
        taxon("ORBV-SER", "Orbuvessa serotina", G::PlanktonicForam, 1.95, 0, 1),
        taxon("TRUO-PEL", "Truncossira pelvensis", G::PlanktonicForam, 3.45, 1.10, 1),
        taxon("LITK-CRU", "Lithokalva crustosa", G::CorallineAlga, old, 0, 4),
        taxon("MESV-OSS", "Mesovessa ossiraki", G::CorallineAlga, 2.85, 0.70, 2),
        taxon("NEOP-TEN", "Neopelvia tenuis", G::CorallineAlga, 0.45, 0, 2),
        taxon("DISK-MAG", "Discokalva magna", G::Nannofossil, old, 3.75, 2),
        taxon("RETV-PEL", "Reticuvessa pelagica", G::Nannofossil, 4.10, 2.20, 2),
        taxon("HELT-TOR", "Helicotorma tormundensis", G::Nannofossil, 2.40, 1.35, 2),
        taxon("CALV-OVA", "Calcivessa ovalis", G::Nannofossil, 1.55, 0.46, 2),
        taxon("GEPO-MIN", "Gephyrossa minima", G::Nannofossil, 0.29, 0, 2),
        taxon("CORV-NOV", "Coronovessa nova", G::Nannofossil, 0.18, 0, 1),
        taxon("TRIK-VAS", "Tridakalva vastimera", G::Mollusc, 3.00, 0, 2),
        taxon("CONV-MIN", "Conovessa minor", G::Mollusc, 1.05, 0.35, 2),
        taxon("TROP-KAL", "Trochopelva kalvessae", G::Mollusc, 0.36, 0.14, 1),
    };
}

std::vector<TimeScaleEvent> timeScaleEvents(const std::vector<TaxonPlan>& taxa) {
    std::vector<TimeScaleEvent> events;
    const std::string source = "invented demo time scale";
    // Older events are less well calibrated: 10 kyr plus 1.5 % of the age.
    auto sd = [](double age_ma) { return roundDp(0.01 + 0.015 * age_ma, 3); };
    for (const auto& t : taxa) {
        if (t.first_ma < kOlderThanAnyReefMa)
            events.push_back({baseEventId(t.taxon), t.taxon, EventKind::Base, t.first_ma,
                              sd(t.first_ma), source, {}});
        if (t.last_ma > 0)
            events.push_back({topEventId(t.taxon), t.taxon, EventKind::Top, t.last_ma,
                              sd(t.last_ma), source, {}});
    }
    std::stable_sort(events.begin(), events.end(),
                     [](const auto& a, const auto& b) { return a.age_ma > b.age_ma; });
    return events;
}

std::vector<Zone> zonationScheme(const std::string& scheme, const std::string& code_prefix,
                                 TaxonGroup group, const std::vector<TaxonPlan>& taxa,
                                 const std::vector<TimeScaleEvent>& events) {
    std::vector<std::string> boundaries; // oldest first, as events are
    for (const auto& e : events) {
        auto it = std::find_if(taxa.begin(), taxa.end(),
                               [&](const TaxonPlan& t) { return t.taxon == e.taxon; });
        if (it != taxa.end() && it->group == group) boundaries.push_back(e.event);
    }
    std::vector<Zone> zones;
    for (std::size_t i = 0; i <= boundaries.size(); ++i) {
        Zone z;
        z.scheme = scheme;
        z.zone = code_prefix + std::to_string(i + 1);
        if (i > 0) z.base_event = boundaries[i - 1];
        if (i < boundaries.size()) z.top_event = boundaries[i];
        zones.push_back(std::move(z));
    }
    return zones;
}

} // namespace atollog::demo
