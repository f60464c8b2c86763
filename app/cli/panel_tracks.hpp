#pragma once
// The data tracks of a panel's columns filled from the engine's results: taxon lanes from the
// observed ranges, zones from the zone report, dates from their computed ages, the age model
// from each hole's model grid, and one age range shared by all columns.
#include "draw/hole_column_input.hpp"

#include "atollog/engine/age_model.hpp"
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/observed_ranges.hpp"
#include "atollog/engine/zone_assignment.hpp"

#include <string>
#include <vector>

namespace atollog::cli {

/// One lane per taxon id in every column, in the order given: counted in-place finds (the
/// settings' abundance threshold applied), reworked and caved finds from the observed ranges.
/// Throws std::invalid_argument naming an unknown taxon id (and how to list them).
void addTaxonLanes(std::vector<draw::HoleColumnInput>& columns, const CoreDataset& data,
                   const std::vector<ObservedRange>& ranges, const std::vector<std::string>& taxa,
                   const BiostratSettings& settings);

/// The zones of `scheme` (empty: every scheme) in every column, each boundary at its pick's plain
/// bracket. An edge whose event is not picked in the hole (or that names no event) is open and
/// reaches to the nearest picked boundary of the scheme beyond the zone's known part, else to
/// the hole's shallowest or deepest sample. A zone with both edges open, or whose picks are
/// inverted in the hole, is left out of that column. Throws std::invalid_argument naming an
/// unknown scheme.
void addZoneLanes(std::vector<draw::HoleColumnInput>& columns, const CoreDataset& data,
                  const ZoneReport& zones, const std::string& scheme);

/// Every date with an age, at its depth bracket: median and 2.5-97.5 % range of its age
/// distribution, flagged when the age model does not use it. Id "<method> <sample or depth m>",
/// as the model labels its ties.
void addDates(std::vector<draw::HoleColumnInput>& columns, const std::vector<DateAge>& dates);

/// The model's grid as the column draws it (both rows at a surface).
draw::ColumnAgeModel columnAgeModel(const AgeModel& model);

/// Sets one age range on every column with an age track: the span of all of their models'
/// 2.5-97.5 % ages and dates' ranges, from 0 Ma when the youngest age is within a tenth of the
/// span from it, so the curves of all holes share one scale.
void setCommonAgeRange(std::vector<draw::HoleColumnInput>& columns);

} // namespace atollog::cli
