// Streaming weighted quantiles against exact sorting of the same weighted values.
#include "atollog/engine/streaming_quantiles.hpp"

#include "../../engine/src/truncated_normal.hpp"

#include <boost/math/distributions/normal.hpp>
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <random>

using namespace atollog;

namespace {

/// The smallest value whose cumulative weight reaches p of the total (the definition used).
double exactWeightedQuantile(std::vector<std::pair<double, std::uint64_t>> v, double p) {
    std::sort(v.begin(), v.end());
    long double total = 0;
    for (auto& x : v)
        total += x.second;
    const long double target = std::max(1.0L, p * total);
    long double cum = 0;
    for (auto& x : v) {
        cum += x.second;
        if (cum >= target)
            return x.first;
    }
    return v.back().first;
}

} // namespace

TEST_CASE("streaming quantiles stay within one bin of exact sorting", "[streaming_quantiles]") {
    std::mt19937_64 rng(2024);
    auto u = [&] { return (rng() >> 11) * 0x1.0p-53; };
    const int bins = 512;
    // Column 0: skewed values, all inside the range; column 1: a range too narrow, so that a
    // tail falls outside and is held exactly.
    StreamingQuantiles q({{0.0, 10.0}, {0.0, 2.0}}, bins);
    std::vector<std::pair<double, std::uint64_t>> c0, c1;
    for (int i = 0; i < 20000; ++i) {
        const double v0 = 10.0 * u() * u();
        const double v1 = 3.0 * u() - 0.5;
        const std::uint64_t w = 1 + (rng() >> 50); // column sums stay below 2^32
        q.add(0, v0, w);
        q.add(1, v1, w);
        c0.emplace_back(v0, w);
        c1.emplace_back(v1, w);
    }
    for (double p : {0.0, 0.001, 0.025, 0.25, 0.5, 0.75, 0.975, 0.999, 1.0}) {
        CHECK(std::fabs(q.quantile(0, p) - exactWeightedQuantile(c0, p)) <= 10.0 / bins);
        CHECK(std::fabs(q.quantile(1, p) - exactWeightedQuantile(c1, p)) <= 2.0 / bins);
    }
    // Outside the range the quantile is exact.
    CHECK(q.quantile(1, 0.05) == exactWeightedQuantile(c1, 0.05));
    CHECK(q.quantile(1, 0.99) == exactWeightedQuantile(c1, 0.99));
    CHECK(q.outsideCount(1) > 5000);
    long double s = 0, w = 0;
    for (auto& x : c0) {
        s += x.first * x.second;
        w += x.second;
    }
    CHECK(q.mean(0) == Approx(static_cast<double>(s / w)).epsilon(1e-12));
}

TEST_CASE("streaming quantiles: merging is exact and order-free", "[streaming_quantiles]") {
    StreamingQuantiles a({{0, 1}}, 64), b({{0, 1}}, 64), all({{0, 1}}, 64);
    for (int i = 0; i < 1000; ++i) {
        const double v = std::fmod(i * 0.618034, 1.3) - 0.1;
        (i % 3 ? a : b).add(0, v, static_cast<std::uint64_t>(i + 1));
        all.add(0, v, static_cast<std::uint64_t>(i + 1));
    }
    StreamingQuantiles ba = b;
    ba.merge(a);
    for (double p : {0.01, 0.3, 0.5, 0.99}) {
        CHECK(ba.quantile(0, p) == all.quantile(0, p));
    }
    CHECK(ba.mean(0) == all.mean(0));
    CHECK_THROWS_AS(StreamingQuantiles({{1, 1}}, 8), std::invalid_argument);
    CHECK_THROWS_AS(all.add(0, std::nan(""), 1), std::invalid_argument);
    StreamingQuantiles empty({{0, 1}}, 8);
    CHECK_THROWS_AS(empty.quantile(0, 0.5), std::invalid_argument);
}

TEST_CASE("normal quantile (AS 241) and truncated normal draws match Boost.Math",
          "[streaming_quantiles]") {
    const boost::math::normal n01;
    for (double p : {1e-300, 1e-20, 1e-12, 1e-5, 0.01, 0.2, 0.5, 0.7, 0.975, 1 - 1e-12}) {
        const double expected = boost::math::quantile(n01, p);
        CHECK(atollog::detail::standardNormalQuantile(p) ==
              Approx(expected).epsilon(1e-14).margin(1e-14));
    }
    // Truncated at the floor, the draw with u has P(X <= x | X >= f) = u.
    for (double floor : {-1.0, 0.5, 3.0, 12.0}) {
        for (double u : {0.01, 0.5, 0.99}) {
            const auto d = atollog::detail::truncatedNormalDraw(0.0, 1.0, floor, u);
            const double mass = boost::math::cdf(boost::math::complement(n01, floor));
            CHECK(d.log_mass == Approx(std::log(mass)).epsilon(1e-10));
            const double above = boost::math::cdf(boost::math::complement(n01, d.value));
            CHECK(1.0 - above / mass == Approx(u).epsilon(1e-7));
        }
    }
    // Far tail: asymptotic log mass.
    const auto far = atollog::detail::truncatedNormalDraw(0.0, 1.0, 40.0, 0.5);
    CHECK(far.value >= 40.0);
    CHECK(far.log_mass == Approx(-800.0 - std::log(40.0) - 0.5 * std::log(2 * M_PI) +
                                 std::log1p(-1.0 / 1600 + 3.0 / 2560000)).epsilon(1e-12));
}

TEST_CASE("a column's weights stop short of 2^32 with a message", "[unit][quantiles][edges]") {
    StreamingQuantiles q({{0.0, 1.0}}, 8);
    q.add(0, 0.5, (std::uint64_t{1} << 32) - 2);
    CHECK_THROWS_WITH(q.add(0, 0.5, 2), Catch::Contains("would reach 2^32"));
    const double values[2] = {0.25, 0.75};
    CHECK_THROWS_WITH(q.addMany(0, values, 2, 1, 1), Catch::Contains("would reach 2^32"));
    q.add(0, 0.25, 1); // exactly up to 2^32 - 1 is fine
    CHECK(q.quantile(0, 0.5) == Approx(0.5).margin(1.0 / 8)); // within one bin
    StreamingQuantiles other({{0.0, 1.0}}, 8);
    other.add(0, 0.5, 1);
    CHECK_THROWS_WITH(q.merge(other), Catch::Contains("would reach 2^32"));
}
