#pragma once
// Runs fixed blocks of work on a few threads. Which thread runs a block never matters to the
// result: callers write per-block or per-item outputs, or merge exact (integer) sums.
#include <algorithm>
#include <atomic>
#include <cstddef>
#include <exception>
#include <mutex>
#include <thread>
#include <vector>

namespace atollog::detail {

/// Calls work(block, thread) for every block in [0, blocks), on min(threads, blocks) threads.
/// The first exception thrown by any call is rethrown here after all threads stop.
template <class Work> void runBlocks(std::size_t blocks, int threads, Work&& work) {
    const std::size_t n_threads =
        std::max<std::size_t>(1, std::min<std::size_t>(static_cast<std::size_t>(threads), blocks));
    std::atomic<std::size_t> next{0};
    std::exception_ptr error;
    std::mutex error_mutex;
    auto loop = [&](std::size_t thread) {
        try {
            for (std::size_t b = next++; b < blocks; b = next++)
                work(b, thread);
        } catch (...) {
            std::lock_guard lock(error_mutex);
            if (!error)
                error = std::current_exception();
            next = blocks;
        }
    };
    std::vector<std::thread> pool;
    for (std::size_t t = 1; t < n_threads; ++t)
        pool.emplace_back(loop, t);
    loop(0);
    for (std::thread& t : pool)
        t.join();
    if (error)
        std::rethrow_exception(error);
}

} // namespace atollog::detail
