#pragma once
// Closed vocabularies of the core data folder (../shared formats contract) and their spellings.
// Each enum has toString() giving the folder spelling and parseX() returning nullopt for an
// unknown word, so that readers can report the word and the list of allowed ones.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace atollog {

enum class HoleKind { Core, Cuttings };
enum class Rock { Limestone, Dolostone, Basalt, Volcaniclastic, Clay, Sand, Gravel, Soil, Cavity };
enum class Texture {
    Mudstone, Wackestone, Packstone, Grainstone, Boundstone, Floatstone, Rudstone,
    Bafflestone, Bindstone, Framestone, Crystalline
};
enum class Binding { None, Baffle, Bind, Frame };
enum class Surface { None, Exposure, Hardground, Erosion };
enum class TaxonGroup {
    Coral, BenthicForam, LargerBenthicForam, PlanktonicForam, Nannofossil, CorallineAlga,
    Mollusc, Other
};
enum class AbundanceClass { Present, Rare, Few, Common, Abundant, Dominant };
enum class OccurrenceStatus { InPlace, Reworked, Caved };
enum class EventKind { Base, Top };
enum class DateMethod { UTh, C14, ArAr, KAr, Sr, Other };

std::string_view toString(HoleKind v);
std::string_view toString(Rock v);
std::string_view toString(Texture v);
std::string_view toString(Binding v);
std::string_view toString(Surface v);
std::string_view toString(TaxonGroup v);
std::string_view toString(AbundanceClass v);
std::string_view toString(OccurrenceStatus v);
std::string_view toString(EventKind v);
std::string_view toString(DateMethod v);

std::optional<HoleKind> parseHoleKind(std::string_view s);
std::optional<Rock> parseRock(std::string_view s);
std::optional<Texture> parseTexture(std::string_view s);
std::optional<Binding> parseBinding(std::string_view s);
std::optional<Surface> parseSurface(std::string_view s);
std::optional<TaxonGroup> parseTaxonGroup(std::string_view s);
std::optional<AbundanceClass> parseAbundanceClass(std::string_view s);
std::optional<OccurrenceStatus> parseOccurrenceStatus(std::string_view s);
std::optional<EventKind> parseEventKind(std::string_view s);
std::optional<DateMethod> parseDateMethod(std::string_view s);

/// The allowed spellings, comma separated, for "expected one of ..." messages.
template <class Enum> std::string allowedWords();

/// All values of an enum in declaration order (for loops and tests).
template <class Enum> std::vector<Enum> allValues();

/// True for carbonate rocks, which carry a texture class.
bool isCarbonate(Rock r);

} // namespace atollog
