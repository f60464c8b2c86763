// The truth folder: small CSV tables written with the same quoting as the core data folder.
#include "truth.hpp"

#include "atollog/db/csv_reader.hpp"

#include <charconv>
#include <cmath>
#include <fstream>
#include <stdexcept>

namespace atollog::demo {
namespace {

/// Shortest text that reads back as the same double.
std::string number(double v) {
    char buf[32];
    const auto res = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, res.ptr);
}

class CsvFile {
public:
    CsvFile(const std::filesystem::path& path, const std::vector<std::string>& header)
        : out_(path, std::ios::binary) {
        if (!out_) throw std::runtime_error("cannot write " + path.string());
        row(header);
    }
    void row(const std::vector<std::string>& fields) {
        for (std::size_t i = 0; i < fields.size(); ++i)
            out_ << (i ? "," : "") << db::csvField(fields[i]);
        out_ << '\n';
    }

private:
    std::ofstream out_;
};

/// The 0.5 m grid of a hole, from the collar to total depth.
std::vector<double> gridM(const TrueHoleHistory& h) {
    std::vector<double> depths;
    for (int i = 0; i * 0.5 <= h.total_depth_m + 1e-9; ++i) depths.push_back(i * 0.5);
    return depths;
}

std::string rounded(double v, int decimals) {
    const double scale = std::pow(10.0, decimals);
    return number(std::round(v * scale) / scale);
}

} // namespace

void writeTruthFolder(const DemoTruth& truth, const std::filesystem::path& folder) {
    std::filesystem::create_directories(folder);
    {
        CsvFile f(folder / "true_age.csv", {"hole", "depth_m", "age_ma"});
        for (const auto& h : truth.holes)
            for (double d : gridM(h)) f.row({h.hole, number(d), rounded(trueAgeMa(h, d), 6)});
    }
    {
        CsvFile f(folder / "true_water_depth.csv", {"hole", "depth_m", "water_depth_m"});
        for (const auto& h : truth.holes)
            for (double d : gridM(h))
                if (auto w = trueWaterDepthM(h, d)) f.row({h.hole, number(d), rounded(*w, 2)});
    }
    {
        CsvFile f(folder / "true_events.csv", {"hole", "event", "depth_m"});
        for (const auto& h : truth.holes)
            for (const auto& e : truth.events) {
                const auto d = trueDepthOfAgeM(h, e.age_ma);
                f.row({h.hole, e.event, d ? rounded(*d, 3) : ""});
            }
    }
    {
        CsvFile f(folder / "true_order.csv", {"rank", "event", "taxon", "kind", "age_ma"});
        for (std::size_t i = 0; i < truth.events.size(); ++i) {
            const auto& e = truth.events[i];
            f.row({std::to_string(i + 1), e.event, e.taxon, std::string(toString(e.kind)),
                   number(e.age_ma)});
        }
    }
    {
        CsvFile f(folder / "true_ranges.csv", {"taxon", "first_ma", "last_ma"});
        for (const auto& r : truth.ranges)
            f.row({r.taxon, number(r.first_ma), number(r.last_ma)});
    }
    {
        CsvFile f(folder / "true_samples.csv",
                  {"hole", "sample", "recorded_depth_m", "true_depth_m", "age_ma"});
        for (const auto& s : truth.samples)
            f.row({s.hole, s.sample, number(s.recorded_depth_m), number(s.true_depth_m),
                   rounded(s.age_ma, 6)});
    }
    {
        CsvFile f(folder / "hiatuses.csv", {"hole", "depth_m", "age_top_ma", "age_base_ma", "kind"});
        for (const auto& h : truth.hiatuses)
            f.row({h.hole, number(h.depth_m), number(h.age_top_ma), number(h.age_base_ma), h.kind});
    }
    {
        CsvFile f(folder / "faults.csv", {"kind", "hole", "item", "description"});
        for (const auto& p : truth.faults) f.row({p.kind, p.hole, p.item, p.description});
    }
    std::ofstream seed(folder / "seed.txt", std::ios::binary);
    seed << truth.seed << '\n';
}

} // namespace atollog::demo
