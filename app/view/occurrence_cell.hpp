#pragma once
// The text of one cell of the occurrence grid: what a sample holds of one taxon, one entry per
// status, written and typed the same way.
//
//   entry   = abundance [mark]      entries separated by ';'
//   abundance: a whole count (12), an abundance word (present, rare, few, common, abundant,
//              dominant), or x when the taxon was seen and no abundance was given
//   mark:    none for in place, "rw" for reworked, "cv" for caved (fallen from higher in the
//            hole); the full words (in_place, reworked, caved) are read too
//
// Examples: "12", "common", "x rw", "25; 3 rw" (25 in place and 3 reworked). An empty cell
// lists nothing. The marks are our own short forms; the tooltip spells them out.
#include "atollog/engine/core_records.hpp"

#include <QString>

#include <map>
#include <optional>
#include <variant>

namespace atollog::view {

/// A cell's entries: per status, the abundance (nullopt: not given).
using OccurrenceCell = std::map<OccurrenceStatus, std::optional<Abundance>>;

/// The mark shown after an abundance for a status: "" (in place), "rw", "cv".
QString statusMark(OccurrenceStatus status);
/// The cell as shown and typed, entries in status order (in place first).
QString occurrenceCellText(const OccurrenceCell &cell);
/// The cell spelled out for a tooltip, e.g. "in place: 25; reworked: 3".
QString occurrenceCellDescription(const OccurrenceCell &cell);
/// Reads typed text; a message naming the bad part and the fix when it cannot be read.
std::variant<OccurrenceCell, QString> readOccurrenceCell(const QString &text);
/// How to type a cell, for tooltips and messages.
QString occurrenceCellSyntax();

} // namespace atollog::view
