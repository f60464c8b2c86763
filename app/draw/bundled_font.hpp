#pragma once

#include <QString>

namespace atollog::draw {

/// Registers the bundled DejaVu Sans (regular and bold, compiled into the library as Qt
/// resources) with QFontDatabase on first use and returns its family name. Every text the
/// drawing layer paints uses this family, so output does not depend on the fonts of the machine.
///
/// Needs a QGuiApplication (QFontDatabase does); throws std::runtime_error when there is none or
/// a font cannot be loaded.
QString bundledFontFamily();

} // namespace atollog::draw
