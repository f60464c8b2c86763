// atollog-demo-gen [--seed N] OUT_FOLDER TRUTH_FOLDER
// Writes the invented demo archipelago as a core data folder, and the truth behind it.
#include "archipelago_generator.hpp"

#include "atollog/db/core_folder.hpp"

#include <cstdint>
#include <exception>
#include <iostream>
#include <string>
#include <vector>

int main(int argc, char** argv) {
    std::uint64_t seed = atollog::demo::kDemoSeed;
    std::vector<std::string> folders;
    try {
        for (int i = 1; i < argc; ++i) {
            const std::string arg = argv[i];
            if (arg == "--seed" && i + 1 < argc) seed = std::stoull(argv[++i]);
            else if (arg == "-h" || arg == "--help") {
                std::cout << "usage: atollog-demo-gen [--seed N] OUT_FOLDER TRUTH_FOLDER\n";
                return 0;
            } else folders.push_back(arg);
        }
        if (folders.size() != 2) {
            std::cerr << "usage: atollog-demo-gen [--seed N] OUT_FOLDER TRUTH_FOLDER\n";
            return 2;
        }
        const auto demo = atollog::demo::generateArchipelago(seed);
        atollog::db::writeCoreFolder(demo.data, folders[0], /*overwrite=*/true);
        atollog::demo::writeTruthFolder(demo.truth, folders[1]);
        std::cout << "seed " << seed << ": " << demo.data.holes.size() << " holes, "
                  << demo.data.runs.size() << " runs, " << demo.data.intervals.size()
                  << " intervals, " << demo.data.samples.size() << " samples, "
                  << demo.data.taxa.size() << " taxa, " << demo.data.occurrences.size()
                  << " occurrences, " << demo.data.events.size() << " events, "
                  << demo.data.dates.size() << " dates\n";
    } catch (const std::exception& e) {
        std::cerr << "atollog-demo-gen: " << e.what() << '\n';
        return 1;
    }
    return 0;
}
