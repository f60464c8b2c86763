#include "draw/hole_column_data_tracks.hpp"

#include <algorithm>

namespace atollog::draw {

std::size_t shownTaxonLanes(const HoleColumnInput &in) {
    return in.tracks.taxa ? in.taxa.size() : 0;
}

std::vector<std::string> shownZoneSchemes(const HoleColumnInput &in) {
    std::vector<std::string> schemes;
    if (!in.tracks.zones) {
        return schemes;
    }
    for (const ColumnZone &z : in.zones) {
        if (std::find(schemes.begin(), schemes.end(), z.scheme) == schemes.end()) {
            schemes.push_back(z.scheme);
        }
    }
    return schemes;
}

bool ageModelShown(const HoleColumnInput &in) {
    return in.tracks.age_model && !in.age_model.rows.empty();
}

bool datesShown(const HoleColumnInput &in) {
    return in.tracks.dates && !in.dates.empty();
}

bool ageTrackShown(const HoleColumnInput &in) {
    return ageModelShown(in) || datesShown(in);
}

} // namespace atollog::draw
