#include "view/column_reorder.hpp"

#include <numeric>

namespace atollog::view {

namespace {

double centreX(const draw::RectMm &box) {
    return box.left_mm + box.width_mm / 2;
}

} // namespace

std::vector<std::size_t> reorderedColumns(const std::vector<draw::RectMm> &boxes,
                                          std::size_t dragged, double shift_mm) {
    std::vector<std::size_t> order(boxes.size());
    std::iota(order.begin(), order.end(), std::size_t{0});
    if (dragged >= boxes.size()) {
        return order;
    }
    const double moved = centreX(boxes[dragged]) + shift_mm;
    std::vector<std::size_t> others;
    for (std::size_t i = 0; i < boxes.size(); ++i) {
        if (i != dragged) {
            others.push_back(i);
        }
    }
    // The dragged column goes before the first other column whose centre lies right of it.
    std::size_t slot = others.size();
    for (std::size_t k = 0; k < others.size(); ++k) {
        if (centreX(boxes[others[k]]) > moved) {
            slot = k;
            break;
        }
    }
    others.insert(others.begin() + static_cast<std::ptrdiff_t>(slot), dragged);
    return others;
}

} // namespace atollog::view
