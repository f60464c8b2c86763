// Carbonate texture after Dunham (1962, AAPG Memoir 1:108) with the Embry & Klovan (1971,
// Bull. Can. Petrol. Geol. 19:730) classes for organically bound and coarse rocks, applied in the
// order of those schemes: recognisable texture, organic binding, over-2 mm components, support.
#include "atollog/engine/texture_classifier.hpp"

#include "atollog/engine/number_text.hpp"

#include <array>
#include <cmath>
#include <stdexcept>

namespace atollog {
namespace {

// Both schemes draw their line at 10 % and leave "exactly 10 %" open; we read "more than 10 %"
// literally, so 10 % itself falls on the lower side (not floatstone/rudstone; mudstone).
constexpr double kThresholdPct = 10.0;

void requirePercent(const std::optional<double> &v, const char *name) {
    if (!v)
        return;
    if (!std::isfinite(*v) || *v < 0.0 || *v > 100.0)
        throw std::invalid_argument(std::string("classifyTexture: ") + name + " " + numberText(*v) +
                                    " is not a percentage; give a value 0-100");
}

void requirePercents(const TextureAttributes &a) {
    requirePercent(a.coarse_pct, "coarse_pct");
    requirePercent(a.grains_pct, "grains_pct");
}

TextureSuggestion decided(Texture t, std::string why) {
    return {t, std::move(why)};
}
TextureSuggestion missing(std::string why) {
    return {std::nullopt, std::move(why)};
}

} // namespace

TextureSuggestion classifyTexture(const TextureAttributes &a) {
    requirePercents(a);
    if (!a.depositional_texture_recognisable)
        return decided(Texture::Crystalline, "depositional texture not recognisable; Dunham 1962");

    // Organically bound rocks are boundstones, split by the organisms' role (Embry & Klovan 1971).
    // Plain "boundstone" would be the answer for a bound rock of unknown role, but Binding has no
    // such value: an unknown binding is nullopt, which leaves bound-or-not itself open.
    if (!a.binding)
        return missing("binding not given: need whether the rock was organically bound at "
                       "deposition, and how, before the other classes can be considered");
    switch (*a.binding) {
    case Binding::Frame:
        return decided(Texture::Framestone,
                       "organically bound, organisms built a rigid frame; Embry & Klovan 1971");
    case Binding::Bind:
        return decided(Texture::Bindstone,
                       "organically bound, organisms encrusted and bound; Embry & Klovan 1971");
    case Binding::Baffle:
        return decided(Texture::Bafflestone,
                       "organically bound, organisms acted as baffles; Embry & Klovan 1971");
    case Binding::None:
        break;
    }

    if (!a.coarse_pct)
        return missing("coarse_pct not given: need the share of components over 2 mm to rule "
                       "floatstone and rudstone in or out");
    if (*a.coarse_pct > kThresholdPct) {
        // Our mud_supported attribute stands for Embry & Klovan's matrix support (matrix = the
        // finer than 2 mm part); "not mud supported" is read as supported by the over-2 mm
        // components.
        const std::string coarse = "coarse_pct " + numberText(*a.coarse_pct) + " > 10";
        if (!a.mud_supported)
            return missing(coarse + " but mud_supported not given: need whether the rock is "
                                    "matrix supported (floatstone) or component supported "
                                    "(rudstone)");
        if (*a.mud_supported)
            return decided(Texture::Floatstone, coarse + ", matrix supported; Embry & Klovan 1971");
        return decided(Texture::Rudstone,
                       coarse + ", supported by the over-2 mm components; Embry & Klovan 1971");
    }

    if (!a.mud_supported)
        return missing("mud_supported not given: need whether the rock is mud supported or "
                       "grain supported");
    if (!*a.mud_supported) {
        if (!a.mud_present)
            return missing("grain-supported: need whether mud is present to choose grainstone "
                           "or packstone");
        if (*a.mud_present)
            return decided(Texture::Packstone, "grain supported, with mud; Dunham 1962");
        return decided(Texture::Grainstone, "grain supported, without mud; Dunham 1962");
    }
    if (!a.grains_pct)
        return missing("mud supported but grains_pct not given: need the share of grains to "
                       "choose wackestone (more than 10 %) or mudstone");
    const std::string grains = "mud supported, grains_pct " + numberText(*a.grains_pct);
    if (*a.grains_pct > kThresholdPct)
        return decided(Texture::Wackestone, grains + " > 10; Dunham 1962");
    return decided(Texture::Mudstone, grains + " <= 10; Dunham 1962");
}

namespace {

// The same decision tree as classifyTexture, walked down every branch an unknown attribute
// leaves open.
class TextureSet {
  public:
    void add(Texture t) { seen_[static_cast<std::size_t>(t)] = true; }
    std::vector<Texture> list() const {
        std::vector<Texture> out;
        for (Texture t : allValues<Texture>())
            if (seen_[static_cast<std::size_t>(t)])
                out.push_back(t);
        return out;
    }

  private:
    std::array<bool, 16> seen_{};
};

void addCoarse(const TextureAttributes &a, TextureSet &out) {
    if (!a.mud_supported || *a.mud_supported)
        out.add(Texture::Floatstone);
    if (!a.mud_supported || !*a.mud_supported)
        out.add(Texture::Rudstone);
}

void addFine(const TextureAttributes &a, TextureSet &out) {
    if (!a.mud_supported || !*a.mud_supported) {
        if (!a.mud_present || *a.mud_present)
            out.add(Texture::Packstone);
        if (!a.mud_present || !*a.mud_present)
            out.add(Texture::Grainstone);
    }
    if (!a.mud_supported || *a.mud_supported) {
        if (!a.grains_pct || *a.grains_pct > kThresholdPct)
            out.add(Texture::Wackestone);
        if (!a.grains_pct || *a.grains_pct <= kThresholdPct)
            out.add(Texture::Mudstone);
    }
}

void addUnbound(const TextureAttributes &a, TextureSet &out) {
    if (!a.coarse_pct || *a.coarse_pct > kThresholdPct)
        addCoarse(a, out);
    if (!a.coarse_pct || *a.coarse_pct <= kThresholdPct)
        addFine(a, out);
}

} // namespace

std::vector<Texture> possibleTextures(const TextureAttributes &a) {
    requirePercents(a);
    TextureSet out;
    if (!a.depositional_texture_recognisable) {
        out.add(Texture::Crystalline);
        return out.list();
    }
    const bool any_binding = !a.binding;
    if (any_binding || *a.binding == Binding::Frame)
        out.add(Texture::Framestone);
    if (any_binding || *a.binding == Binding::Bind)
        out.add(Texture::Bindstone);
    if (any_binding || *a.binding == Binding::Baffle)
        out.add(Texture::Bafflestone);
    if (any_binding || *a.binding == Binding::None)
        addUnbound(a, out);
    return out.list();
}

TextureAttributes textureAttributesOf(const LithInterval &interval) {
    TextureAttributes a;
    a.binding = interval.binding;
    a.coarse_pct = interval.coarse_pct;
    a.mud_supported = interval.mud_supported;
    a.grains_pct = interval.grains_pct;
    return a;
}

} // namespace atollog
