#include "view/occurrence_cell.hpp"

#include <QStringList>

namespace atollog::view {

namespace {

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }

QString abundanceText(const std::optional<Abundance> &a) {
    if (!a) {
        return QStringLiteral("x");
    }
    if (const auto *count = std::get_if<std::int64_t>(&*a)) {
        return QString::number(*count);
    }
    return word(toString(std::get<AbundanceClass>(*a)));
}

std::optional<OccurrenceStatus> readMark(const QString &mark) {
    const QString m = mark.toLower();
    if (m == QLatin1String("rw") || m == QLatin1String("reworked")) return OccurrenceStatus::Reworked;
    if (m == QLatin1String("cv") || m == QLatin1String("caved")) return OccurrenceStatus::Caved;
    if (m == QLatin1String("in_place") || m == QLatin1String("ip")) return OccurrenceStatus::InPlace;
    return std::nullopt;
}

} // namespace

QString statusMark(OccurrenceStatus status) {
    switch (status) {
    case OccurrenceStatus::Reworked: return QStringLiteral("rw");
    case OccurrenceStatus::Caved: return QStringLiteral("cv");
    case OccurrenceStatus::InPlace: break;
    }
    return {};
}

QString occurrenceCellText(const OccurrenceCell &cell) {
    QStringList entries;
    for (const auto &[status, abundance] : cell) {
        const QString mark = statusMark(status);
        entries << (mark.isEmpty() ? abundanceText(abundance)
                                   : abundanceText(abundance) + QLatin1Char(' ') + mark);
    }
    return entries.join(QStringLiteral("; "));
}

QString occurrenceCellDescription(const OccurrenceCell &cell) {
    QStringList entries;
    for (const auto &[status, abundance] : cell) {
        entries << QStringLiteral("%1: %2").arg(
            word(toString(status)).replace(QLatin1Char('_'), QLatin1Char(' ')),
            abundance ? abundanceText(abundance) : QStringLiteral("seen, no abundance given"));
    }
    return entries.join(QStringLiteral("; "));
}

QString occurrenceCellSyntax() {
    return QStringLiteral(
        "type a count (12) or a word (%1), or x when seen without an abundance; then rw for "
        "reworked or cv for caved (nothing: in place); several entries separated by ';', e.g. "
        "'25; 3 rw'; clear the cell to remove the taxon from the sample")
        .arg(word(allowedWords<AbundanceClass>()));
}

std::variant<OccurrenceCell, QString> readOccurrenceCell(const QString &text) {
    OccurrenceCell cell;
    const QStringList entries = text.split(QLatin1Char(';'), Qt::SkipEmptyParts);
    for (const QString &raw : entries) {
        const QString entry = raw.simplified();
        if (entry.isEmpty()) {
            continue;
        }
        QStringList parts = entry.split(QLatin1Char(' '));
        OccurrenceStatus status = OccurrenceStatus::InPlace;
        if (parts.size() == 2) {
            const auto s = readMark(parts[1]);
            if (!s) {
                return QStringLiteral("'%1' is not a status mark; use rw (reworked), cv (caved) "
                                      "or nothing (in place)")
                    .arg(parts[1]);
            }
            status = *s;
        } else if (parts.size() != 1) {
            return QStringLiteral("'%1' cannot be read: %2").arg(entry, occurrenceCellSyntax());
        }
        std::optional<Abundance> abundance;
        const QString a = parts[0].toLower();
        bool is_count = false;
        const qlonglong count = a.toLongLong(&is_count);
        if (is_count) {
            abundance = static_cast<std::int64_t>(count); // a negative count is the engine's to refuse
        } else if (const auto cls = parseAbundanceClass(a.toStdString())) {
            abundance = *cls;
        } else if (a != QLatin1String("x")) {
            return QStringLiteral("'%1' is not an abundance: %2").arg(parts[0], occurrenceCellSyntax());
        }
        if (cell.count(status) != 0) {
            return QStringLiteral("'%1' lists the %2 status twice; give one entry per status")
                .arg(text, word(toString(status)));
        }
        cell[status] = abundance;
    }
    return cell;
}

} // namespace atollog::view
