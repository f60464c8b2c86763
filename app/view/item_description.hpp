#pragma once
// A drawn item in words, from its role and key: the first line of the canvas tooltip and the
// heading of the selection details.
#include "draw/display_list.hpp"

#include <QString>

namespace atollog::view {

/// What the item is, e.g. "tie line: B CYKA-VAS", "interval 12.50-14.00 m", "sample K1-04".
/// Roles of other drawings (range chart, age-depth plot) get their key alone.
QString describeItem(const draw::ItemTag &tag);

/// True for the roles that stand for a tie (line, band, label) or an isochron; the details pane
/// looks these up in the panel's input.
bool isTieRole(draw::ItemRole role);
bool isIsochronRole(draw::ItemRole role);

} // namespace atollog::view
