#include "view/value_with_sd.hpp"

#include "atollog/engine/number_text.hpp"
#include "view/depth_unit.hpp"

#include <QStringList>

#include <charconv>
#include <system_error>

namespace atollog::view {

QString exactNumberText(double value) {
    // Fixed notation (0.0004, not 4e-04), still the shortest text that reads back exactly.
    char buf[400];
    const auto res = std::to_chars(buf, buf + sizeof buf, value, std::chars_format::fixed);
    if (res.ec != std::errc()) {
        return QString::fromStdString(numberText(value));
    }
    return QString::fromLatin1(buf, static_cast<int>(res.ptr - buf));
}

QString valueWithSdText(double value, double sd) {
    return QStringLiteral("%1 ± %2").arg(exactNumberText(value), exactNumberText(sd));
}

std::optional<std::pair<double, double>> readValueWithSd(const QString &text) {
    QString t = text;
    for (const char *sign : {"+/-", "+-", "±"}) {
        t.replace(QString::fromUtf8(sign), QStringLiteral(" "));
    }
    const QStringList parts = t.simplified().split(QLatin1Char(' '), Qt::SkipEmptyParts);
    if (parts.size() != 2) {
        return std::nullopt;
    }
    const auto value = readNumber(parts[0]);
    const auto sd = readNumber(parts[1]);
    if (!value || !sd) {
        return std::nullopt;
    }
    return std::pair{*value, *sd};
}

} // namespace atollog::view
