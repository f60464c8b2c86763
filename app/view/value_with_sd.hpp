#pragma once
// A measured value with its one-sd uncertainty in one cell, "0.77094 ± 0.00251": both numbers
// at full precision (the shortest text that reads back to the same double, so re-typing the
// shown text writes nothing). Typed as "a ± b", "a +- b", "a +/- b" or "a b".
#include <QString>

#include <optional>
#include <utility>

namespace atollog::view {

QString valueWithSdText(double value, double sd);
/// A number at full precision (for measurements, where 3 decimals would lose digits).
QString exactNumberText(double value);
/// (value, sd), or nullopt when the text is not two numbers.
std::optional<std::pair<double, double>> readValueWithSd(const QString &text);

} // namespace atollog::view
