// readCoreFolder: finds the table files of a core data folder, reads each with its header
// resolved against the format contract, and then checks the whole dataset, mapping each issue
// of the check back to the file, line and column as the user wrote them.
#include "atollog/db/core_folder.hpp"
#include "atollog/db/csv_reader.hpp"
#include "atollog/engine/validation.hpp"

#include "csv_cursor.hpp"
#include "folder_tables.hpp"
#include "problem_list.hpp"
#include "row_cells.hpp"
#include "table_header.hpp"
#include "table_records.hpp"

#include <algorithm>
#include <cctype>
#include <cerrno>
#include <cstring>
#include <fstream>
#include <map>
#include <memory>
#include <optional>
#include <sstream>

namespace atollog::db {
namespace {

namespace fs = std::filesystem;
using folder_io::ProblemList;

/// What is kept of a table file after reading: its text, header, and where each row starts, so
/// that an issue found later by validateDataset can be placed and its cell quoted as written.
struct ReadTable {
    Table table;
    std::string text;
    std::unique_ptr<folder_io::TableHeader> header;
    std::vector<std::size_t> row_line;
    std::vector<std::size_t> row_offset;
};

InputProblem fileProblem(std::string file, std::string problem, std::string fix) {
    InputProblem p;
    p.file = std::move(file);
    p.problem = std::move(problem);
    p.fix = std::move(fix);
    return p;
}

std::string allowedFileNames() {
    std::string out;
    for (const auto& t : folder_io::folderTables()) {
        if (!out.empty()) out += ", ";
        out += tableFileName(t.table);
    }
    return out;
}

bool endsWithCsv(const std::string& name) {
    if (name.size() < 4) return false;
    std::string ext = name.substr(name.size() - 4);
    std::transform(ext.begin(), ext.end(), ext.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return ext == ".csv";
}

/// The table files present, in contract order. Files that are not *.csv, hidden files (editor
/// and OS companions such as "._holes.csv") and subfolders are not part of the folder.
std::map<Table, fs::path> findTableFiles(const fs::path& folder, ProblemList& problems) {
    std::map<Table, fs::path> found;
    std::error_code ec;
    for (const auto& entry : fs::directory_iterator(folder, ec)) {
        const std::string name = entry.path().filename().string();
        if (name.empty() || name.front() == '.' || !endsWithCsv(name)) continue;
        std::error_code type_ec;
        if (entry.is_directory(type_ec)) continue;
        std::optional<Table> table;
        for (const auto& t : folder_io::folderTables())
            if (tableFileName(t.table) == name) table = t.table;
        if (!table) {
            problems.add(fileProblem(name, "unknown file name in a core data folder",
                                     "rename it to one of: " + allowedFileNames() +
                                         "; or move it out of the folder"));
            continue;
        }
        found.emplace(*table, entry.path());
    }
    if (ec)
        problems.add(fileProblem(folder.string(), "cannot list the folder: " + ec.message(),
                                 "check that the folder exists and can be read"));
    return found;
}

std::optional<std::string> readWholeFile(const fs::path& path, const std::string& name,
                                         ProblemList& problems) {
    std::ifstream in(path, std::ios::binary);
    if (!in) {
        problems.add(fileProblem(name, std::string("cannot open the file: ") + std::strerror(errno),
                                 "check that the file exists and that you may read it"));
        return std::nullopt;
    }
    std::ostringstream buffer;
    buffer << in.rdbuf();
    if (in.bad()) {
        problems.add(fileProblem(name, "cannot read the file", "check the file and the disk"));
        return std::nullopt;
    }
    return std::move(buffer).str();
}

bool hasNoHeader(std::string_view text) {
    if (text.substr(0, 3) == "\xEF\xBB\xBF") text.remove_prefix(3);
    return std::all_of(text.begin(), text.end(), [](char c) { return c == '\n' || c == '\r'; });
}

std::string requiredColumnList(const folder_io::TableSpec& spec) {
    std::string out;
    std::size_t n = 0;
    for (const auto& c : spec.columns) {
        if (!c.required) continue;
        if (!out.empty()) out += ", ";
        out += c.name;
        ++n;
    }
    return (n == 1 ? "the column " : "the columns ") + out;
}

void readTable(ReadTable& t, const fs::path& path, CoreDataset& data, ProblemList& problems) {
    const std::string file(tableFileName(t.table));
    const auto& spec = folder_io::tableSpec(t.table);
    auto text = readWholeFile(path, file, problems);
    if (!text) return;
    t.text = std::move(*text);
    if (hasNoHeader(t.text)) {
        problems.add(fileProblem(file,
                                 "empty file: expected a header row with at least " +
                                     requiredColumnList(spec),
                                 "write the column names on the first line, or delete the file"));
        return;
    }
    try {
        std::optional<folder_io::RowCells> cells;
        readCsv(
            t.text, file,
            [&](const CsvRecord& header) {
                t.header = std::make_unique<folder_io::TableHeader>(spec, header, file, problems);
                cells.emplace(*t.header, problems);
            },
            [&](const CsvRecord& record) {
                // With a broken header the cells cannot be interpreted; the CSV syntax of the
                // rest is still checked.
                if (!t.header->usable()) return;
                cells->start(record);
                if (folder_io::appendRecord(t.table, *cells, data)) {
                    t.row_line.push_back(record.line);
                    t.row_offset.push_back(record.offset);
                }
            });
    } catch (const InputError& e) {
        problems.addAll(e.problems());
    }
}

/// Places a dataset issue in the file: line of the row, column as written, the cell as written.
InputProblem problemOf(const DataIssue& issue, const std::vector<ReadTable>& tables) {
    InputProblem p;
    p.file = std::string(tableFileName(issue.table));
    p.column = issue.column;
    p.value = issue.value;
    p.problem = issue.problem;
    p.fix = issue.fix;
    p.is_warning = issue.severity == Severity::Warning;
    const auto t = std::find_if(tables.begin(), tables.end(),
                                [&](const ReadTable& r) { return r.table == issue.table; });
    if (t == tables.end() || !t->header || !issue.row || *issue.row >= t->row_line.size())
        return p;
    const std::size_t row = *issue.row;
    p.line = t->row_line[row];
    const int column = issue.column.empty() ? -1 : t->header->columnNamed(issue.column);
    if (column < 0 || t->header->fieldOf(column) < 0) return p;
    p.column = t->header->writtenName(column);
    if (p.column != issue.column) // the check works in metres and Ma; say so beside feet or ka
        p.problem += " (checked in metres and Ma; the file gives " + p.column + ")";
    const auto field = static_cast<std::size_t>(t->header->fieldOf(column));
    p.column_number = field + 1;
    // Quote the cell as the user wrote it (in feet or ka if the file used them).
    folder_io::CsvCursor cursor(t->text, p.file, t->row_offset[row], p.line, false);
    CsvRecord record;
    if (cursor.next(record) && field < record.fields.size() && !record.fields[field].empty())
        p.value = record.fields[field];
    return p;
}

} // namespace

struct ParsedCoreFolder::Impl {
    CoreDataset data;
    std::vector<ReadTable> tables;
};

ParsedCoreFolder::ParsedCoreFolder(std::unique_ptr<Impl> impl) : impl_(std::move(impl)) {}
ParsedCoreFolder::ParsedCoreFolder(ParsedCoreFolder&&) noexcept = default;
ParsedCoreFolder& ParsedCoreFolder::operator=(ParsedCoreFolder&&) noexcept = default;
ParsedCoreFolder::~ParsedCoreFolder() = default;

const CoreDataset& ParsedCoreFolder::data() const { return impl_->data; }
CoreDataset ParsedCoreFolder::takeData() && { return std::move(impl_->data); }

ParsedCoreFolder parseCoreFolder(const fs::path& folder) {
    ProblemList problems;
    std::error_code ec;
    if (!fs::is_directory(folder, ec))
        throw InputError({fileProblem(folder.string(),
                                      fs::exists(folder, ec) ? "not a folder" : "folder not found",
                                      "give the path of a core data folder (a folder holding "
                                      "holes.csv and the other tables)")});
    const auto files = findTableFiles(folder, problems);
    if (!files.count(Table::Holes))
        problems.add(fileProblem("holes.csv",
                                 "holes.csv not found in " + folder.string() +
                                     ": a core data folder needs at least holes.csv",
                                 "add holes.csv with at least the columns hole and site"));

    auto impl = std::make_unique<ParsedCoreFolder::Impl>();
    impl->tables.reserve(files.size());
    for (const auto& [table, path] : files) {
        impl->tables.push_back(ReadTable{table, {}, nullptr, {}, {}});
        readTable(impl->tables.back(), path, impl->data, problems);
    }
    if (problems.count() > 0) throw InputError(problems.listed());
    return ParsedCoreFolder(std::move(impl));
}

std::vector<InputProblem> ParsedCoreFolder::check() const {
    std::vector<InputProblem> found;
    bool has_errors = false;
    for (const DataIssue& issue : validateDataset(impl_->data)) {
        found.push_back(problemOf(issue, impl_->tables));
        has_errors = has_errors || issue.severity == Severity::Error;
    }
    if (has_errors) {
        ProblemList all;
        std::stable_partition(found.begin(), found.end(),
                              [](const InputProblem& p) { return !p.is_warning; });
        all.addAll(found);
        throw InputError(all.listed());
    }
    return found;
}

CoreDataset readCoreFolder(const fs::path& folder, std::vector<InputProblem>* warnings) {
    ParsedCoreFolder parsed = parseCoreFolder(folder);
    std::vector<InputProblem> found = parsed.check();
    if (warnings) *warnings = std::move(found);
    return std::move(parsed).takeData();
}

} // namespace atollog::db
