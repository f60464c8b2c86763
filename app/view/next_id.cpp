#include "view/next_id.hpp"

#include <algorithm>
#include <cctype>

namespace atollog::view {

std::string nextId(const std::string &last, const std::vector<std::string> &taken) {
    std::size_t digits_at = last.size();
    while (digits_at > 0 && std::isdigit(static_cast<unsigned char>(last[digits_at - 1]))) {
        --digits_at;
    }
    // At most 18 digits are read as a number: enough for any id a logger types.
    const bool numbered = digits_at < last.size() && last.size() - digits_at <= 18;
    const std::string stem = numbered ? last.substr(0, digits_at) : last + "-";
    const std::size_t width = numbered ? last.size() - digits_at : 1;
    unsigned long long n = numbered ? std::stoull(last.substr(digits_at)) + 1 : 2;
    for (;; ++n) {
        std::string number = std::to_string(n);
        if (number.size() < width) {
            number.insert(0, width - number.size(), '0');
        }
        std::string id = stem + number;
        if (std::find(taken.begin(), taken.end(), id) == taken.end()) {
            return id;
        }
    }
}

} // namespace atollog::view
