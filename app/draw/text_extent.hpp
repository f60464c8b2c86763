#pragma once

#include "draw/display_list.hpp"

#include <string_view>

namespace atollog::draw {

constexpr double kMmPerPoint = 25.4 / 72.0;

/// An upper estimate of the advance width of a text in the bundled DejaVu Sans, from a bound per
/// class of character, without asking a font engine (layouts stay pure functions, usable without
/// a QGuiApplication). A draw test checks it against QFontMetricsF of the bundled font.
double estimateTextWidth_mm(std::string_view utf8, double size_pt, FontWeight weight);

/// Height of one line box of the bundled font at this size (ascent + descent).
double textLineHeight_mm(double size_pt);

} // namespace atollog::draw
