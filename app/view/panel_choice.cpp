#include "view/panel_choice.hpp"

#include <map>
#include <optional>
#include <stdexcept>

namespace atollog::view {

PanelChoice showEverything(const draw::PanelInput &full) {
    PanelChoice choice;
    for (const auto &column : full.columns) {
        choice.hole_order.push_back(column.hole);
    }
    for (const auto &tie : full.ties) {
        choice.shown_events.insert(tie.event);
    }
    for (const auto &iso : full.isochrons) {
        choice.shown_isochrons.insert(iso.label);
    }
    return choice;
}

namespace {

/// Keeps the entries at shown columns, renumbered; nothing when none is shown.
template <class At>
std::vector<At> remapped(const std::vector<At> &at, const std::map<std::size_t, std::size_t> &to) {
    std::vector<At> out;
    for (At a : at) {
        if (const auto it = to.find(a.column); it != to.end()) {
            a.column = it->second;
            out.push_back(a);
        }
    }
    return out;
}

} // namespace

draw::PanelInput choosePanelContent(const draw::PanelInput &full, const PanelChoice &choice) {
    draw::PanelInput out;
    out.title = full.title;
    std::map<std::size_t, std::size_t> new_index; // old column -> new column
    for (const std::string &hole : choice.hole_order) {
        std::optional<std::size_t> found;
        for (std::size_t i = 0; i < full.columns.size(); ++i) {
            if (full.columns[i].hole == hole) {
                found = i;
            }
        }
        if (!found) {
            throw std::invalid_argument("hole order names '" + hole +
                                        "', which the project does not have");
        }
        new_index[*found] = out.columns.size();
        out.columns.push_back(full.columns[*found]);
    }
    for (const auto &tie : full.ties) {
        if (choice.shown_events.count(tie.event) == 0) {
            continue;
        }
        draw::PanelTie kept{tie.event, remapped(tie.at, new_index)};
        if (!kept.at.empty()) {
            out.ties.push_back(std::move(kept));
        }
    }
    for (const auto &iso : full.isochrons) {
        if (choice.shown_isochrons.count(iso.label) == 0) {
            continue;
        }
        draw::PanelIsochron kept{iso.label, iso.age_ma, remapped(iso.at, new_index)};
        if (!kept.at.empty()) {
            out.isochrons.push_back(std::move(kept));
        }
    }
    return out;
}

} // namespace atollog::view
