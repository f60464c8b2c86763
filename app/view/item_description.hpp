#pragma once
// A drawn item in words, from its role and key: the first line of the canvas tooltip and the
// heading of the selection details.
#include "draw/display_list.hpp"
#include "draw/panel_input.hpp"

#include <QString>

#include <cstddef>
#include <optional>

namespace atollog::view {

/// What the item is, e.g. "tie line: B CYKA-VAS", "interval 12.50-14.00 m", "sample K1-04".
/// Roles of other drawings (range chart, age-depth plot) get their key alone.
QString describeItem(const draw::ItemTag &tag);

/// True for the roles of a hole column's data tracks (taxon lanes, zones, dates, age model).
bool isColumnTrackRole(draw::ItemRole role);

/// The words for a data-track item with what the input holds on it: a taxon's finds (m), a
/// zone's boundary brackets, a date's age, range and method, the age model's quantiles at
/// `depth_m` (the cursor's depth in the column, when known). Every column holding the key when
/// `column` is unset (a click on a key shared by holes lists them all). Empty for other roles.
QString describeTrackItem(const draw::PanelInput &input, const draw::ItemTag &tag,
                          std::optional<std::size_t> column, std::optional<double> depth_m);

/// True for the roles that stand for a tie (line, band, label) or an isochron; the details pane
/// looks these up in the panel's input.
bool isTieRole(draw::ItemRole role);
bool isIsochronRole(draw::ItemRole role);

} // namespace atollog::view
