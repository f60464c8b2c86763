// writeCoreFolder: the canonical export of a dataset. All file texts are built in memory first,
// written into a hidden temporary folder beside the target, and renamed into place, so that a
// failure leaves either the old folder or nothing, never a half-written one.
#include "atollog/db/core_folder.hpp"
#include "atollog/db/csv_reader.hpp"

#include "folder_tables.hpp"
#include "table_cells.hpp"

#include <algorithm>
#include <fstream>
#include <map>
#include <optional>
#include <set>
#include <random>
#include <stdexcept>

namespace atollog::db {
namespace {

namespace fs = std::filesystem;
using folder_io::TableSpec;

struct FileText {
    std::string name;
    std::string text;
};

/// Free attribute names of a table: in first-seen order over its rows, except that a name
/// comes after every name that precedes it within some row. Reading gives each row its cells in
/// header order, so this keeps each row's own order and the round trip exact (rows that order
/// two names both ways cannot all be kept; those names fall back to first-seen order).
template <class Row> std::vector<std::string> freeColumns(const std::vector<Row>& rows, Table t) {
    std::vector<std::string> names;
    std::map<std::string, std::size_t, std::less<>> index_of;
    std::vector<std::set<std::size_t>> after; // after[i]: names that must follow name i
    for (const Row& row : rows) {
        std::optional<std::size_t> previous;
        for (const auto& [name, value] : row.extra) {
            if (name.size() <= 2 || name.compare(0, 2, "x_") != 0)
                throw std::invalid_argument("cannot export " + std::string(tableFileName(t)) +
                                            ": free attribute '" + name +
                                            "' does not start with x_");
            auto [it, inserted] = index_of.try_emplace(name, names.size());
            if (inserted) {
                names.push_back(name);
                after.emplace_back();
            }
            if (previous) after[*previous].insert(it->second);
            previous = it->second;
        }
    }
    // Kahn's topological sort, always taking the earliest-seen name that is free to go.
    std::vector<std::size_t> pending(names.size(), 0);
    for (const auto& next : after)
        for (std::size_t n : next) ++pending[n];
    std::vector<bool> placed(names.size(), false);
    std::vector<std::string> order;
    while (order.size() < names.size()) {
        std::size_t pick = names.size();
        for (std::size_t i = 0; i < names.size() && pick == names.size(); ++i)
            if (!placed[i] && pending[i] == 0) pick = i;
        if (pick == names.size()) // contradicting rows: take the earliest left
            for (std::size_t i = 0; i < names.size() && pick == names.size(); ++i)
                if (!placed[i]) pick = i;
        placed[pick] = true;
        order.push_back(names[pick]);
        for (std::size_t n : after[pick])
            if (pending[n] > 0) --pending[n];
    }
    return order;
}

std::string_view freeValue(const FreeAttributes& extra, const std::string& name) {
    for (const auto& [n, v] : extra)
        if (n == name) return v;
    return {};
}

/// A column is written when it is required or some row gives it a value: columns empty in every
/// row are left out (reading an absent column gives the same "not given").
template <class Row>
std::string tableText(const TableSpec& spec, const std::vector<Row>& rows) {
    std::vector<int> columns;
    for (std::size_t c = 0; c < spec.columns.size(); ++c) {
        const int column = static_cast<int>(c);
        if (spec.columns[c].required ||
            std::any_of(rows.begin(), rows.end(),
                        [&](const Row& r) { return !folder_io::cellText(r, column).empty(); }))
            columns.push_back(column);
    }
    const std::vector<std::string> free = freeColumns(rows, spec.table);

    std::string out;
    bool first = true;
    const auto put = [&](std::string_view cell) {
        if (!first) out += ',';
        first = false;
        out += csvField(cell);
    };
    for (const int c : columns) put(spec.columns[static_cast<std::size_t>(c)].name);
    for (const auto& name : free) put(name);
    out += '\n';
    for (const Row& row : rows) {
        first = true;
        for (const int c : columns) put(folder_io::cellText(row, c));
        for (const auto& name : free) put(freeValue(row.extra, name));
        out += '\n';
    }
    return out;
}

template <class Row>
void addTable(std::vector<FileText>& files, Table t, const std::vector<Row>& rows) {
    if (rows.empty() && t != Table::Holes) return; // holes.csv is always written
    files.push_back({std::string(tableFileName(t)), tableText(folder_io::tableSpec(t), rows)});
}

std::vector<FileText> folderTexts(const CoreDataset& d) {
    std::vector<FileText> files;
    addTable(files, Table::Holes, d.holes);
    addTable(files, Table::Runs, d.runs);
    addTable(files, Table::Intervals, d.intervals);
    addTable(files, Table::Samples, d.samples);
    addTable(files, Table::Taxa, d.taxa);
    addTable(files, Table::Occurrences, d.occurrences);
    addTable(files, Table::Events, d.events);
    addTable(files, Table::Dates, d.dates);
    addTable(files, Table::Zones, d.zones);
    addTable(files, Table::SeaLevel, d.sea_level);
    addTable(files, Table::Curve, d.curve);
    return files;
}

std::string randomSuffix() {
    std::random_device device;
    std::mt19937_64 rng(device());
    static constexpr char kHex[] = "0123456789abcdef";
    std::string s;
    for (int i = 0; i < 12; ++i) s += kHex[rng() % 16];
    return s;
}

/// A new, empty hidden folder beside `target`, named after it.
fs::path makeSiblingFolder(const fs::path& target, std::string_view role) {
    for (int attempt = 0; attempt < 16; ++attempt) {
        const fs::path candidate = target.parent_path() / ("." + target.filename().string() + "." +
                                                           std::string(role) + "-" + randomSuffix());
        if (fs::create_directory(candidate)) return candidate;
    }
    throw std::runtime_error("cannot export to " + target.string() +
                             ": cannot create a temporary folder beside it");
}

void writeFile(const fs::path& path, const std::string& text) {
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out.write(text.data(), static_cast<std::streamsize>(text.size()));
    out.close();
    if (!out)
        throw std::runtime_error("cannot write " + path.string() +
                                 ": check free disk space and permissions");
}

} // namespace

void writeCoreFolder(const CoreDataset& data, const fs::path& folder, bool overwrite) {
    const std::vector<FileText> files = folderTexts(data);

    fs::path target = fs::absolute(folder).lexically_normal();
    if (target.filename().empty()) target = target.parent_path(); // "out/" names "out"
    const bool exists = fs::exists(target);
    if (exists && !fs::is_directory(target))
        throw std::runtime_error("cannot export to " + target.string() +
                                 ": it is a file, not a folder; choose a folder path");
    const bool occupied = exists && !fs::is_empty(target);
    if (occupied && !overwrite)
        throw std::runtime_error("cannot export to " + target.string() +
                                 ": the folder is not empty; choose an empty or new folder, or "
                                 "allow overwriting it");
    fs::create_directories(target.parent_path());

    const fs::path temp = makeSiblingFolder(target, "export");
    try {
        for (const FileText& f : files) writeFile(temp / f.name, f.text);
    } catch (...) {
        std::error_code ignored;
        fs::remove_all(temp, ignored);
        throw;
    }
    if (!occupied) {
        if (exists) fs::remove(target); // an empty folder gives way to the new one
        fs::rename(temp, target);
        return;
    }
    // Replace: the old folder moves aside first, so that at every moment either the old or the
    // new complete folder is at the target path.
    const fs::path old = target.parent_path() / ("." + target.filename().string() + ".replaced-" +
                                                 randomSuffix());
    fs::rename(target, old);
    try {
        fs::rename(temp, target);
    } catch (...) {
        std::error_code ignored;
        fs::rename(old, target, ignored);
        fs::remove_all(temp, ignored);
        throw;
    }
    std::error_code ignored;
    fs::remove_all(old, ignored);
}

} // namespace atollog::db
