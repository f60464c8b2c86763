#include "atollog/engine/vocabulary.hpp"

#include <array>
#include <utility>

namespace atollog {
namespace {

template <class Enum, std::size_t N>
using Words = std::array<std::pair<Enum, std::string_view>, N>;

constexpr Words<HoleKind, 2> kHoleKind{{{HoleKind::Core, "core"}, {HoleKind::Cuttings, "cuttings"}}};
constexpr Words<Rock, 9> kRock{{{Rock::Limestone, "limestone"},
                                {Rock::Dolostone, "dolostone"},
                                {Rock::Basalt, "basalt"},
                                {Rock::Volcaniclastic, "volcaniclastic"},
                                {Rock::Clay, "clay"},
                                {Rock::Sand, "sand"},
                                {Rock::Gravel, "gravel"},
                                {Rock::Soil, "soil"},
                                {Rock::Cavity, "cavity"}}};
constexpr Words<Texture, 11> kTexture{{{Texture::Mudstone, "mudstone"},
                                       {Texture::Wackestone, "wackestone"},
                                       {Texture::Packstone, "packstone"},
                                       {Texture::Grainstone, "grainstone"},
                                       {Texture::Boundstone, "boundstone"},
                                       {Texture::Floatstone, "floatstone"},
                                       {Texture::Rudstone, "rudstone"},
                                       {Texture::Bafflestone, "bafflestone"},
                                       {Texture::Bindstone, "bindstone"},
                                       {Texture::Framestone, "framestone"},
                                       {Texture::Crystalline, "crystalline"}}};
constexpr Words<Binding, 4> kBinding{{{Binding::None, "none"},
                                      {Binding::Baffle, "baffle"},
                                      {Binding::Bind, "bind"},
                                      {Binding::Frame, "frame"}}};
constexpr Words<Surface, 4> kSurface{{{Surface::None, "none"},
                                      {Surface::Exposure, "exposure"},
                                      {Surface::Hardground, "hardground"},
                                      {Surface::Erosion, "erosion"}}};
constexpr Words<TaxonGroup, 8> kGroup{{{TaxonGroup::Coral, "coral"},
                                       {TaxonGroup::BenthicForam, "benthic_foram"},
                                       {TaxonGroup::LargerBenthicForam, "larger_benthic_foram"},
                                       {TaxonGroup::PlanktonicForam, "planktonic_foram"},
                                       {TaxonGroup::Nannofossil, "nannofossil"},
                                       {TaxonGroup::CorallineAlga, "coralline_alga"},
                                       {TaxonGroup::Mollusc, "mollusc"},
                                       {TaxonGroup::Other, "other"}}};
constexpr Words<AbundanceClass, 6> kAbundance{{{AbundanceClass::Present, "present"},
                                               {AbundanceClass::Rare, "rare"},
                                               {AbundanceClass::Few, "few"},
                                               {AbundanceClass::Common, "common"},
                                               {AbundanceClass::Abundant, "abundant"},
                                               {AbundanceClass::Dominant, "dominant"}}};
constexpr Words<OccurrenceStatus, 3> kStatus{{{OccurrenceStatus::InPlace, "in_place"},
                                              {OccurrenceStatus::Reworked, "reworked"},
                                              {OccurrenceStatus::Caved, "caved"}}};
constexpr Words<EventKind, 2> kEventKind{{{EventKind::Base, "base"}, {EventKind::Top, "top"}}};
constexpr Words<DateMethod, 6> kMethod{{{DateMethod::UTh, "u-th"},
                                        {DateMethod::C14, "c14"},
                                        {DateMethod::ArAr, "ar-ar"},
                                        {DateMethod::KAr, "k-ar"},
                                        {DateMethod::Sr, "sr"},
                                        {DateMethod::Other, "other"}}};

template <class Enum, std::size_t N>
std::string_view wordOf(const Words<Enum, N>& words, Enum v) {
    for (const auto& [e, w] : words)
        if (e == v) return w;
    return "?";
}
template <class Enum, std::size_t N>
std::optional<Enum> enumOf(const Words<Enum, N>& words, std::string_view s) {
    for (const auto& [e, w] : words)
        if (w == s) return e;
    return std::nullopt;
}
template <class Enum, std::size_t N> std::string joined(const Words<Enum, N>& words) {
    std::string out;
    for (const auto& [e, w] : words) {
        if (!out.empty()) out += ", ";
        out += w;
    }
    return out;
}
template <class Enum, std::size_t N> std::vector<Enum> values(const Words<Enum, N>& words) {
    std::vector<Enum> out;
    for (const auto& [e, w] : words) out.push_back(e);
    return out;
}

} // namespace

#define ATOLLOG_VOCAB(Enum, table)                                                                 \
    std::string_view toString(Enum v) { return wordOf(table, v); }                                 \
    std::optional<Enum> parse##Enum(std::string_view s) { return enumOf(table, s); }               \
    template <> std::string allowedWords<Enum>() { return joined(table); }                         \
    template <> std::vector<Enum> allValues<Enum>() { return values(table); }

ATOLLOG_VOCAB(HoleKind, kHoleKind)
ATOLLOG_VOCAB(Rock, kRock)
ATOLLOG_VOCAB(Texture, kTexture)
ATOLLOG_VOCAB(Binding, kBinding)
ATOLLOG_VOCAB(Surface, kSurface)
ATOLLOG_VOCAB(TaxonGroup, kGroup)
ATOLLOG_VOCAB(AbundanceClass, kAbundance)
ATOLLOG_VOCAB(OccurrenceStatus, kStatus)
ATOLLOG_VOCAB(EventKind, kEventKind)
ATOLLOG_VOCAB(DateMethod, kMethod)

#undef ATOLLOG_VOCAB

bool isCarbonate(Rock r) { return r == Rock::Limestone || r == Rock::Dolostone; }

} // namespace atollog
