#pragma once
// Counts finished blocks of a computation for its WorkProgress, one report at a time, and
// throws WorkStopped once the reporter has said stop (on every thread that advances after).
#include "atollog/engine/work_progress.hpp"

#include <cstddef>
#include <mutex>

namespace atollog::detail {

class ProgressCounter {
  public:
    /// Reports 0 of `total` when there is a reporter.
    ProgressCounter(const WorkProgress& report, std::size_t total);
    ProgressCounter(const ProgressCounter&) = delete;
    ProgressCounter& operator=(const ProgressCounter&) = delete;

    /// One more block done: reports it; throws WorkStopped when this or an earlier report
    /// said stop. Thread-safe.
    void advance();
    std::size_t done() const { return done_; }

  private:
    const WorkProgress& report_;
    std::size_t total_;
    std::size_t done_ = 0;
    bool stopped_ = false;
    std::mutex mutex_;
};

} // namespace atollog::detail
