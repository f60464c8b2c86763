#pragma once
// The hand-made hole TAV-2 (sample_hole_column.hpp; invented like all demo data) with its data
// tracks: two taxa (one with a reworked and a caved find), two zones of one scheme sharing a
// picked boundary plus an open-ended one, three dates (one not used by the model), and an age
// model with a surface at 19.5 m (two rows at that depth).
#include "draw/hole_column_input.hpp"
#include "sample_hole_column.hpp"

namespace atollog::draw::test {

inline HoleColumnInput sampleColumnWithTracks() {
    HoleColumnInput in = sampleHoleColumn();
    in.taxa = {
        {"TAVK-MIN", "Tavekia minor", "larger_benthic_foram", {3.2, 6.2, 9.1, 12.2}, {1.2}, {15.4}},
        {"RUSO-LAT", "Rusovella lata", "coral", {21.0, 24.2, 30.5}, {}, {}},
    };
    in.zones = {
        {"TV forams", "TV2", {0.6, 0.6, true}, {10.0, 12.0, false}},
        {"TV forams", "TV1", {10.0, 12.0, false}, {33.0, 36.0, false}},
        {"TV nannos", "TN1", {4.0, 5.0, false}, {40.0, 40.0, true}},
    };
    in.dates = {
        {"u-th TAV-2-03", "u-th", 3.0, 3.4, 0.0062, 0.0058, 0.0066, true},
        {"u-th TAV-2-11", "u-th", 15.0, 16.2, 0.0185, 0.0170, 0.0200, true},
        {"c14 TAV-2-14", "c14", 24.0, 24.6, 0.030, 0.026, 0.034, false},
    };
    in.age_model.rows = {
        {0.0, 0.0, 0.0, 0.002},   {5.0, 0.004, 0.007, 0.010}, {10.0, 0.008, 0.014, 0.020},
        {19.5, 0.015, 0.021, 0.030}, // above the exposure surface at 19.5 m
        {19.5, 0.110, 0.125, 0.140}, // below it: the surface stands for about 0.1 Myr
        {30.0, 0.140, 0.160, 0.185}, {45.0, 0.200, 0.230, 0.260},
    };
    return in;
}

} // namespace atollog::draw::test
