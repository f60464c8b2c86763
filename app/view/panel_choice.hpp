#pragma once
// What the user chose to see of a project's panel: which events and ages, holes in which order.
// Choosing is selection only: the panel's content comes whole from the CLI library, so the
// viewer repeats no analysis.
#include "draw/panel_input.hpp"

#include <set>
#include <string>
#include <vector>

namespace atollog::view {

struct PanelChoice {
    std::vector<std::string> hole_order;   ///< hole ids left to right; holes not named are hidden
    std::set<std::string> shown_events;    ///< PanelTie::event
    std::set<std::string> shown_isochrons; ///< PanelIsochron::label
};

/// Everything shown, holes in the input's order.
PanelChoice showEverything(const draw::PanelInput &full);

/// The panel with only the chosen holes (in the chosen order), ties and isochrons, their column
/// indices renumbered. Ties and isochrons reaching no shown hole are dropped. A hole named in
/// the order but not in the input throws std::invalid_argument.
draw::PanelInput choosePanelContent(const draw::PanelInput &full, const PanelChoice &choice);

} // namespace atollog::view
