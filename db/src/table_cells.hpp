#pragma once
// The canonical text of each cell of a record, for export: metres and Ma, numbers in shortest
// round-trip form, vocabulary words as spelled in the format contract, "" for "not given".
#include "atollog/engine/core_records.hpp"

#include <string>

namespace atollog::db::folder_io {

/// `column` indexes tableSpec(<table of the row>).columns (see folder_tables.hpp, namespace col).
std::string cellText(const Hole& row, int column);
std::string cellText(const CoreRun& row, int column);
std::string cellText(const LithInterval& row, int column);
std::string cellText(const Sample& row, int column);
std::string cellText(const Taxon& row, int column);
std::string cellText(const Occurrence& row, int column);
std::string cellText(const TimeScaleEvent& row, int column);
std::string cellText(const NumericalDate& row, int column);
std::string cellText(const Zone& row, int column);
std::string cellText(const SeaLevelPoint& row, int column);
std::string cellText(const CalibrationPoint& row, int column);

} // namespace atollog::db::folder_io
