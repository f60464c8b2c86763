// Logged carbonate textures against the rock and against the attributes logged beside them.
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/texture_classifier.hpp"
#include "atollog/engine/validation_detail.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::detail {
namespace {

bool usablePercent(const std::optional<double> &v) {
    return !v || (std::isfinite(*v) && *v >= 0.0 && *v <= 100.0);
}

bool isBoundstoneClass(Texture t) {
    return t == Texture::Framestone || t == Texture::Bindstone || t == Texture::Bafflestone;
}

/// A logged texture is consistent when the attributes allow it for some value of the
/// attributes not given. Two readings beyond possibleTextures:
/// - "boundstone" is the parent of framestone, bindstone and bafflestone (Embry & Klovan 1971);
/// - "crystalline" says the depositional texture is not recognisable (Dunham 1962), which the
///   folder has no column for: it is the logger's call and is accepted as logged.
/// Grainstone and packstone both stay allowed for a grain-supported rock, as the folder does not
/// record whether mud is present.
bool consistent(Texture logged, const std::vector<Texture> &possible) {
    if (logged == Texture::Crystalline)
        return true;
    if (logged == Texture::Boundstone)
        return std::any_of(possible.begin(), possible.end(), isBoundstoneClass);
    return std::find(possible.begin(), possible.end(), logged) != possible.end();
}

std::string joined(const std::vector<Texture> &textures) {
    std::string out;
    for (Texture t : textures) {
        if (!out.empty())
            out += ", ";
        out += toString(t);
    }
    return out;
}

} // namespace

void validateTextures(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.intervals.size(); ++i) {
        const LithInterval &v = data.intervals[i];
        if (!v.texture)
            continue;
        const std::string subject = "interval " + numberText(v.top_m) + "-" + numberText(v.base_m) +
                                    " m of hole " + quoted(v.hole);
        const std::string logged(toString(*v.texture));
        if (!isCarbonate(v.rock)) {
            out.warning(Table::Intervals, i, "texture", logged,
                        subject + ": texture " + logged + " is given for " +
                            std::string(toString(v.rock)) +
                            ", but texture classes apply to carbonate rocks only",
                        "clear texture, or set rock to limestone or dolostone");
            continue;
        }
        // Out-of-range percentages are reported by validateValueRanges.
        if (!usablePercent(v.grains_pct) || !usablePercent(v.coarse_pct))
            continue;
        const TextureAttributes attributes = textureAttributesOf(v);
        const std::vector<Texture> possible = possibleTextures(attributes);
        if (consistent(*v.texture, possible))
            continue;
        const TextureSuggestion suggestion = classifyTexture(attributes);
        const std::string expected =
            suggestion.texture ? std::string(toString(*suggestion.texture)) +
                                     " suggested by its attributes (" + suggestion.reason + ")"
                               : "its attributes, which allow only " + joined(possible);
        out.warning(Table::Intervals, i, "texture", logged,
                    subject + ": texture " + logged + " disagrees with " + expected,
                    "check the texture against mud_supported, grains_pct, coarse_pct and binding, "
                    "and correct whichever is wrong");
    }
}

} // namespace atollog::detail
