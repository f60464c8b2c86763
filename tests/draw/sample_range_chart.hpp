#pragma once
// A small hand-made range chart input shared by the drawing tests. Hole, taxa and depths are
// invented for the tests.

#include "draw/range_chart_input.hpp"

#include <filesystem>

namespace atollog::draw::test {

inline RangeChartInput sampleRangeChart() {
    RangeChartInput in;
    in.hole = "KT-7";
    in.top_m = 20.0;
    in.base_m = 60.0;
    in.scale_ratio = 200.0; // 5 mm per metre
    in.recovery = {{20.0, 26.5, true}, {26.5, 29.0, false}, {29.0, 37.0, true}, {37.0, 38.0, false},
                   {38.0, 47.0, true}, {47.0, 56.0, true},  {56.0, 60.0, false}};
    for (const double d :
         {21.0, 22.0, 24.0, 26.5, 28.0, 30.5, 33.0, 35.0, 41.2, 44.0, 47.5, 52.0, 56.0}) {
        in.samples.push_back({"S" + std::to_string(static_cast<int>(d * 10)), d, true});
    }
    in.samples.push_back({"S380", 38.0, false});
    in.samples.push_back({"S500", 50.0, false});

    using K = OccurrenceKind;
    in.taxa = {
        {"tx-a",
         "Atollina prima",
         "larger_benthic_foram",
         {{24.0, K::InPlace, 3},
          {30.5, K::InPlace, 4},
          {41.2, K::InPlace, 2},
          {52.0, K::Reworked, 1}}},
        {"tx-b",
         "Lagunella minor",
         "benthic_foram",
         {{35.0, K::InPlace, 1}, {47.5, K::InPlace, 5}, {28.0, K::Caved, 2}}},
        {"tx-c", "Reefia crassa", "coral", {{22.0, K::InPlace, 0}}},
        {"tx-d", "Ghostella vetus", "mollusc", {{33.0, K::Reworked, 1}, {44.0, K::Reworked, 2}}},
    };

    ChartPick top_a{"top-a", "tx-a", PickKind::Top, 23.0, 22.0, 24.0, 20.5, std::nullopt, false};
    ChartPick base_a{"base-a", "tx-a",       PickKind::Base, 42.6, 41.2,
                     44.0,     std::nullopt, std::nullopt,   false};
    ChartPick base_b{"base-b", "tx-b",       PickKind::Base, 48.75, 47.5,
                     50.0,     std::nullopt, 53.0,           false};
    ChartPick top_c{"top-c", "tx-c",       PickKind::Top, 21.5, 21.0,
                    22.0,    std::nullopt, std::nullopt,  true};
    in.picks = {top_a, base_a, base_b, top_c};
    return in;
}

/// A fresh directory under the system temporary directory for one test's files.
inline std::filesystem::path testOutputDir(const std::string &name) {
    const auto dir = std::filesystem::temp_directory_path() / "atollog-draw-tests" / name;
    std::filesystem::create_directories(dir);
    return dir;
}

} // namespace atollog::draw::test
