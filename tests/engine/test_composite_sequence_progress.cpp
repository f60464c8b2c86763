// Composite sequence with a progress reporter: the reporter hears every block of annealing
// moves once and in order, never changes a bit of the result at any thread count, and stops the
// search (WorkStopped) when it says so.
#include "atollog/engine/composite_sequence.hpp"

#include "../../engine/src/composite_sequence_annealer.hpp"
#include "../../engine/src/composite_sequence_pairs.hpp"
#include "composite_sequence_fixture.hpp"

#include <catch2/catch.hpp>

#include <atomic>
#include <mutex>
#include <utility>
#include <vector>

using namespace atollog;

namespace {

SequenceSettings settings(int restarts, int threads) {
    SequenceSettings s;
    s.seed = 4242;
    s.restarts = restarts;
    s.moves_per_restart = 20000;
    s.threads = threads;
    return s;
}

bool identical(const CompositeSequence& a, const CompositeSequence& b) {
    if (a.extensions.size() != b.extensions.size())
        return false;
    for (std::size_t i = 0; i < a.extensions.size(); ++i)
        if (a.extensions[i].event != b.extensions[i].event ||
            a.extensions[i].hole != b.extensions[i].hole ||
            a.extensions[i].placed_m != b.extensions[i].placed_m)
            return false;
    return a.order == b.order && a.misfit == b.misfit && a.position_min == b.position_min &&
           a.position_max == b.position_max && a.restart_misfits == b.restart_misfits &&
           a.moves_tried == b.moves_tried && a.moves_accepted == b.moves_accepted;
}

} // namespace

TEST_CASE("sequence progress counts every block once, in order, and changes nothing",
          "[correlation][sequence][progress]") {
    const CorrelationData d = seqtest::inventData(31, 10, 3, 4, 30.0).data;
    // Blocks per restart: ceil(64 / restarts); counted for the first pass and the replay.
    for (const auto& [restarts, total] :
         std::vector<std::pair<int, std::size_t>>{{4, 2 * 4 * 16}, {5, 2 * 5 * 13}, {100, 200}}) {
        for (const int threads : {1, 2}) {
            INFO("restarts " << restarts << ", threads " << threads);
            std::vector<std::pair<std::size_t, std::size_t>> reports;
            std::mutex reports_mutex;
            std::atomic<int> inside{0}, overlapping{0};
            const WorkProgress progress = [&](std::size_t done, std::size_t of) {
                if (inside++ > 0) ++overlapping; // calls must never overlap
                {
                    std::lock_guard lock(reports_mutex);
                    reports.emplace_back(done, of);
                }
                --inside;
                return true;
            };
            const SequenceSettings s = settings(restarts, threads);
            const CompositeSequence with = buildCompositeSequence(d, s, {}, progress);
            const CompositeSequence without = buildCompositeSequence(d, s);
            CHECK(identical(with, without));
            CHECK(identical(with, buildCompositeSequence(d, settings(restarts, 1))));
            CHECK(overlapping == 0);
            REQUIRE(reports.size() == total + 1);
            for (std::size_t i = 0; i < reports.size(); ++i) {
                CHECK(reports[i].first == i);
                CHECK(reports[i].second == total);
            }
        }
    }
}

TEST_CASE("a sequence reporter that says stop stops the search with WorkStopped",
          "[correlation][sequence][progress]") {
    const CorrelationData d = seqtest::inventData(31, 10, 3, 4, 30.0).data;
    for (const int threads : {1, 2}) {
        INFO("threads " << threads);
        std::atomic<std::size_t> calls{0};
        const WorkProgress stop_after_three = [&](std::size_t done, std::size_t) {
            ++calls;
            return done < 3;
        };
        CHECK_THROWS_AS(buildCompositeSequence(d, settings(4, threads), {}, stop_after_three),
                        WorkStopped);
        CHECK(calls == 4); // 0, 1, 2 and the 3 that said stop; no report after it
        const WorkProgress never = [](std::size_t, std::size_t) { return false; };
        CHECK_THROWS_AS(buildCompositeSequence(d, settings(4, threads), {}, never), WorkStopped);
    }
}

TEST_CASE("blocks of moves cut one annealing run without changing it",
          "[correlation][sequence][progress]") {
    const CorrelationData d = seqtest::inventData(7, 8, 2, 3, 25.0).data;
    detail::OrderRules rules = detail::hardOrderRules(d);
    const std::vector<std::size_t> start = detail::meanLevelStartOrder(d, rules);
    std::vector<double> cost = detail::pairCostMatrix(d, MisfitUnit::Metres);
    const double start_misfit = detail::misfitFromMatrix(cost, start);
    const detail::SequenceSearchSpace space =
        detail::makeSearchSpace(std::move(cost), std::move(rules));
    auto none = [](const std::vector<std::size_t>&, std::size_t, std::size_t, double) {};
    const detail::RestartOutcome whole =
        detail::annealRestart(space, start, start_misfit, 77, 5003, none);
    for (const std::int64_t blocks : {1, 2, 7, 64, 5003}) {
        INFO("blocks " << blocks);
        std::int64_t ends = 0;
        const detail::RestartOutcome cut = detail::annealRestart(
            space, start, start_misfit, 77, 5003, none, [&] { ++ends; }, blocks);
        CHECK(ends == blocks);
        CHECK(cut.best_order == whole.best_order);
        CHECK(cut.best_misfit == whole.best_misfit);
        CHECK(cut.tried == whole.tried);
        CHECK(cut.accepted == whole.accepted);
        CHECK(cut.end_temperature == whole.end_temperature);
    }
}
