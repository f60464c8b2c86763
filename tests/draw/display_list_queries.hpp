#pragma once
// Finding items in a display list by role and key, for the drawing tests.
#include "draw/display_list.hpp"

#include <catch2/catch.hpp>

#include <set>
#include <string>
#include <variant>
#include <vector>

namespace atollog::draw::test {

/// Every item of type T with this role, in list order.
template <class T> std::vector<const T *> itemsOf(const DisplayList &list, ItemRole role) {
    std::vector<const T *> out;
    for (const DisplayItem *item : list.withRole(role)) {
        if (const T *typed = std::get_if<T>(item)) {
            out.push_back(typed);
        }
    }
    return out;
}

/// The one item of type T with this role and key; fails the test when there is none or several.
template <class T>
const T &onlyItem(const DisplayList &list, ItemRole role, const std::string &key) {
    const T *found = nullptr;
    for (const T *item : itemsOf<T>(list, role)) {
        if (item->tag.key == key) {
            REQUIRE(found == nullptr);
            found = item;
        }
    }
    REQUIRE(found != nullptr);
    return *found;
}

/// The texts of every legend row (the legend lists what is drawn, and only that).
inline std::set<std::string> legendTexts(const DisplayList &list) {
    std::set<std::string> out;
    for (const Text *t : itemsOf<Text>(list, ItemRole::LegendText)) {
        out.insert(t->text);
    }
    return out;
}

} // namespace atollog::draw::test
