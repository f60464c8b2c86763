#pragma once
// The unit depths are shown and typed in on the logging desk. Depths are stored in metres
// always; feet exist only on screen. 1 ft = 0.3048 m exactly (the international foot of the
// 1959 agreement between the national standards laboratories of the USA, UK, Canada,
// Australia, New Zealand and South Africa).
#include <QString>

#include <optional>

namespace atollog::view {

enum class DepthUnit { Metre, Foot };

inline constexpr double kMetresPerFoot = 0.3048; // exact by definition (1959)

/// A depth in metres as a number in `unit`.
double depthInUnit(double depth_m, DepthUnit unit);
/// A number typed in `unit` as metres.
double depthInMetres(double value, DepthUnit unit);
/// "m" or "ft".
QString unitSymbol(DepthUnit unit);
/// The depth as shown in a cell: in `unit`, at most 3 decimals (mm in metres, about 1/3 mm
/// in feet), no trailing zeros.
QString depthText(double depth_m, DepthUnit unit);
/// A plain number as shown in a cell: at most 3 decimals, no trailing zeros.
QString numberCellText(double value);
/// Reads a typed number (a dot or a comma as the decimal sign); nullopt when it is not a
/// finite number.
std::optional<double> readNumber(const QString &text);

} // namespace atollog::view
