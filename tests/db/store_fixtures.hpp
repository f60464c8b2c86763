#pragma once
// Shared helpers for the project-store tests: unique temporary project paths that clean up
// after themselves, and a hand-built dataset of an invented archipelago touching every field.
#include "atollog/engine/core_dataset.hpp"

#include <atomic>
#include <chrono>
#include <filesystem>
#include <fstream>
#include <iterator>
#include <string>
#include <unistd.h>

namespace atollog::test {

/// A path under the system temp folder, unique per process and call; removes the file and
/// SQLite's companions (-wal, -shm, -journal) or a folder of that name when it goes.
class TempPath {
  public:
    explicit TempPath(const std::string& stem) {
        static std::atomic<int> counter{0};
        const auto tick = std::chrono::steady_clock::now().time_since_epoch().count();
        path_ = std::filesystem::temp_directory_path() /
                ("atollog-" + stem + "-" + std::to_string(::getpid()) + "-" +
                 std::to_string(tick) + "-" + std::to_string(counter++) + ".atollog");
    }
    TempPath(const TempPath&) = delete;
    TempPath& operator=(const TempPath&) = delete;
    ~TempPath() {
        std::error_code ignored;
        for (const char* suffix : {"", "-wal", "-shm", "-journal"}) {
            std::filesystem::remove_all(path_.string() + suffix, ignored);
        }
    }
    const std::filesystem::path& path() const { return path_; }

  private:
    std::filesystem::path path_;
};

inline std::string fileBytes(const std::filesystem::path& file) {
    std::ifstream in(file, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

/// Every member of every record type is set to a non-default value somewhere, optional members
/// both given and not given, and free attributes appear on every table (with non-ASCII text).
inline CoreDataset everyFieldDataset() {
    CoreDataset d;
    d.holes = {
        {"KV-1", "Kelvaro Reef, windward flat", -17.25, 151.125, 3.5, 42.0, HoleKind::Core,
         {{"x_driller", "Séverine Ablard"}, {"x_rig", "RX-2"}}},
        {"KV-2", "Nérith lagoon islet", std::nullopt, std::nullopt, std::nullopt, std::nullopt,
         HoleKind::Cuttings, {{"x_rig", "珊瑚 rig — spare"}}},
    };
    d.runs = {
        {"KV-1", "KV-1-R1", 0.0, 3.05, 2.9, {{"x_bit", "NQ"}}},
        {"KV-1", "KV-1-R2", 3.05, 6.1, 0.0, {}},
        {"KV-2", "KV-2-R1", 0.0, 12.5, 12.5, {}},
    };
    LithInterval full;
    full.hole = "KV-1";
    full.top_m = 0.0;
    full.base_m = 1.25;
    full.rock = Rock::Limestone;
    full.texture = Texture::Boundstone;
    full.mud_supported = false;
    full.grains_pct = 35.5;
    full.coarse_pct = 12.0;
    full.binding = Binding::Frame;
    full.base_surface = Surface::Exposure;
    full.paleodepth_min_m = 0.0;
    full.paleodepth_max_m = 6.0;
    full.dry_density_g_cm3 = 2.31;
    full.porosity_pct = 18.75;
    full.caco3_pct = 98.5;
    full.notes = "head coral, \"quoted\", line\nbreak; ümlaut";
    full.extra = {{"x_photo", "IMG_0042.jpg"}};
    LithInterval sparse;
    sparse.hole = "KV-1";
    sparse.top_m = 1.25;
    sparse.base_m = 2.0;
    sparse.rock = Rock::Basalt;
    sparse.mud_supported = true;
    d.intervals = {full, sparse};
    d.samples = {
        {"KV-1", "KV-1-S1", 0.5, 0.55, "core", {{"x_tray", "T1"}}},
        {"KV-1", "KV-1-S2", 1.1, 1.1, "", {}},
        {"KV-2", "KV-2-S1", 4.0, 4.2, "cuttings", {}},
    };
    d.taxa = {
        {"TX-A", "Porites nerithensis", TaxonGroup::Coral, {{"x_author", "Ablard, 2031"}}},
        {"TX-B", "Amphistegina kelvarica", TaxonGroup::LargerBenthicForam, {}},
        {"TX-C", "Globorotalia invented", TaxonGroup::PlanktonicForam, {}},
    };
    d.occurrences = {
        {"KV-1-S1", "TX-A", AbundanceClass::Dominant, OccurrenceStatus::InPlace,
         {{"x_counter", "SA"}}},
        {"KV-1-S1", "TX-B", std::int64_t{17}, OccurrenceStatus::Reworked, {}},
        {"KV-1-S2", "TX-C", std::nullopt, OccurrenceStatus::Caved, {}},
        {"KV-2-S1", "TX-C", std::int64_t{0}, OccurrenceStatus::InPlace, {}},
    };
    d.events = {
        {"EV-1", "TX-C", EventKind::Base, 5.72, 0.05, "Invented Time Scale 2030",
         {{"x_note", "calibrated"}}},
        {"EV-2", "TX-C", EventKind::Top, 3.13, 0.125, "", {}},
    };
    NumericalDate by_sample;
    by_sample.hole = "KV-1";
    by_sample.sample = "KV-1-S1";
    by_sample.method = DateMethod::UTh;
    by_sample.uth = UThMeasurement{0.0123, 0.0002, 1.146, 0.0015, 0.35, 2850.0};
    by_sample.extra = {{"x_lab", "Laboratoire Nérith"}};
    NumericalDate by_depth;
    by_depth.hole = "KV-2";
    by_depth.depth_m = 7.75;
    by_depth.method = DateMethod::C14;
    by_depth.c14 = C14Measurement{0.8731, 0.0021, 45.0, 20.0};
    NumericalDate entered_age;
    entered_age.hole = "KV-2";
    entered_age.sample = "KV-2-S1";
    entered_age.depth_m = 4.1;
    entered_age.method = DateMethod::ArAr;
    entered_age.age_ma = 1.0 / 3.0; // not a short decimal: checks the exact round trip
    entered_age.age_sd_ma = 0.01;
    entered_age.uth = UThMeasurement{0.5, 0.01, 1.1, 0.02, std::nullopt, std::nullopt};
    entered_age.c14 = C14Measurement{0.5, 0.01, std::nullopt, std::nullopt};
    d.dates = {by_sample, by_depth, entered_age};
    d.zones = {
        {"Invented planktonic", "IP1", "EV-1", "EV-2", {{"x_colour", "blue"}}},
        {"Invented planktonic", "IP2", std::nullopt, "EV-1", {}},
        {"Other scheme", "IP1", std::nullopt, std::nullopt, {}},
    };
    d.sea_level = {{0.125, -120.5, 5.0, {{"x_curve", "synthetic"}}},
                   {0.0, 0.0, std::nullopt, {}}};
    d.curve = {{1000.0, 1100.0, 15.0, {{"x_set", "demo"}}}, {2000.0, 2050.0, 20.0, {}}};
    return d;
}

} // namespace atollog::test
