// Calibration curve: the file need not be sorted, but each calendar age appears once, since a
// curve is a function of cal_bp.
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/validation_detail.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::detail {

void validateCurve(const CoreDataset &data, IssueList &out) {
    std::vector<std::pair<double, std::size_t>> cal;
    cal.reserve(data.curve.size());
    for (std::size_t i = 0; i < data.curve.size(); ++i)
        if (std::isfinite(data.curve[i].cal_bp))
            cal.emplace_back(data.curve[i].cal_bp, i);
    std::sort(cal.begin(), cal.end());
    std::size_t first = 0;
    for (std::size_t k = 1; k < cal.size(); ++k) {
        if (cal[k].first != cal[first].first) {
            first = k;
            continue;
        }
        out.error(Table::Curve, cal[k].second, "cal_bp", numberText(cal[k].first),
                  "cal_bp " + numberText(cal[k].first) + " appears again (first in data row " +
                      std::to_string(cal[first].second + 1) + ")",
                  "keep one point per calendar age; delete or correct the duplicate");
    }
}

} // namespace atollog::detail
