#include "draw/text_extent.hpp"

namespace atollog::draw {

namespace {
// Advance widths of DejaVu Sans in em, bounded from above per class of character (values from
// the font's hmtx table as QFontMetricsF reports them): the widest letters M, W, m, w and the
// signs @ % run to 1.0 em (1.17 bold); other capitals to 0.78 (0.85 bold); the narrow letters
// f i j l r t, space and light punctuation to 0.42 (0.50 bold); the rest of lower case, digits
// and punctuation stay under 0.66 (0.75 bold). A class bound, not an average, so that a
// name of wide letters is not underestimated; a draw test checks it against QFontMetricsF.
struct AdvanceEm {
    double wide;
    double capital;
    double narrow;
    double other;
};
constexpr AdvanceEm kRegular{1.0, 0.78, 0.42, 0.66};
constexpr AdvanceEm kBold{1.17, 0.85, 0.50, 0.75};
// Ascent + descent of DejaVu Sans is 1.164 em (from its hhea table, as QFontMetricsF reports).
constexpr double kLineHeightEm = 1.17;

bool isWide(char c) {
    return c == 'M' || c == 'W' || c == 'm' || c == 'w' || c == '@' || c == '%';
}
bool isNarrow(char c) {
    return std::string_view("fijlrt .,:;'|!()[]-").find(c) != std::string_view::npos;
}

} // namespace

double estimateTextWidth_mm(std::string_view utf8, double size_pt, FontWeight weight) {
    const AdvanceEm &em = weight == FontWeight::Bold ? kBold : kRegular;
    double width_em = 0.0;
    for (const char c : utf8) {
        const auto byte = static_cast<unsigned char>(c);
        if ((byte & 0xC0u) == 0x80u) {
            continue; // a UTF-8 continuation byte: not a new character
        }
        if (byte >= 0x80u) {
            width_em += em.wide; // outside ASCII (dashes, accented letters): assume the widest
        } else if (isWide(c)) {
            width_em += em.wide;
        } else if (c >= 'A' && c <= 'Z') {
            width_em += em.capital;
        } else if (isNarrow(c)) {
            width_em += em.narrow;
        } else {
            width_em += em.other;
        }
    }
    return width_em * size_pt * kMmPerPoint;
}

double textLineHeight_mm(double size_pt) {
    return size_pt * kMmPerPoint * kLineHeightEm;
}

} // namespace atollog::draw
