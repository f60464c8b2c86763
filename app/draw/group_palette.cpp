#include "draw/group_palette.hpp"

#include <array>
#include <utility>

namespace atollog::draw {

namespace {

struct GroupStyle {
    std::string_view word;
    std::string_view label;
    std::uint32_t rgb;
};

// Okabe & Ito (2008) values. Groups that often sit side by side on a reef chart (coral and
// coralline alga, the three foraminifera groups) get colours that differ in lightness as well
// as hue, so they also separate in greyscale print. Yellow goes to molluscs, the group most
// often drawn sparsely; every bar has a dark outline so yellow still reads on white paper.
constexpr std::array<GroupStyle, 8> kGroups{{
    {"coral", "coral", 0xE69F00},                               // orange
    {"coralline_alga", "coralline alga", 0xCC79A7},             // reddish purple
    {"benthic_foram", "benthic foram", 0x56B4E9},               // sky blue
    {"larger_benthic_foram", "larger benthic foram", 0x0072B2}, // blue
    {"planktonic_foram", "planktonic foram", 0x009E73},         // bluish green
    {"nannofossil", "nannofossil", 0xD55E00},                   // vermillion
    {"mollusc", "mollusc", 0xF0E442},                           // yellow
    {"other", "other", 0x000000},                               // black
}};

constexpr std::uint32_t kUnknownGroupGrey = 0x999999;

} // namespace

Colour groupColour(std::string_view group_word) {
    for (const GroupStyle &g : kGroups) {
        if (g.word == group_word) {
            return colourFromHex(g.rgb);
        }
    }
    return colourFromHex(kUnknownGroupGrey);
}

std::string_view groupLabelWord(std::string_view group_word) {
    for (const GroupStyle &g : kGroups) {
        if (g.word == group_word) {
            return g.label;
        }
    }
    return group_word;
}

} // namespace atollog::draw
