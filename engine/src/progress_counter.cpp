#include "progress_counter.hpp"

#include <algorithm>

namespace atollog::detail {

ProgressCounter::ProgressCounter(const WorkProgress& report, std::size_t total)
    : report_(report), total_(total) {
    if (report_ && !report_(0, total_))
        throw WorkStopped();
}

void ProgressCounter::advance() {
    std::lock_guard lock(mutex_);
    if (stopped_)
        throw WorkStopped();
    done_ = std::min(done_ + 1, total_);
    if (report_ && !report_(done_, total_)) {
        stopped_ = true;
        throw WorkStopped();
    }
}

} // namespace atollog::detail
