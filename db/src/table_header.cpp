#include "table_header.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <optional>
#include <set>

namespace atollog::db::folder_io {
namespace {

struct UnitChoice {
    std::string_view suffix;
    DecimalScale scale;
    std::string_view unit_name; // for messages
};
constexpr std::array<UnitChoice, 1> kPlainUnits{{{"", kSameUnit, ""}}};
constexpr std::array<UnitChoice, 2> kLengthUnits{
    {{"_m", kSameUnit, "metres"}, {"_ft", kFeetToMetres, "feet"}}};
constexpr std::array<UnitChoice, 3> kAgeUnits{{{"_ma", kSameUnit, "Ma"},
                                               {"_ka", kKaToMa, "ka"},
                                               {"_yr", kYrToMa, "years"}}};

std::span<const UnitChoice> unitsOf(Quantity q) {
    switch (q) {
    case Quantity::Length: return kLengthUnits;
    case Quantity::Age: return kAgeUnits;
    case Quantity::Plain: break;
    }
    return kPlainUnits;
}

struct Match {
    int column;
    UnitChoice unit;
};

std::optional<Match> matchName(const TableSpec& spec, std::string_view name) {
    for (std::size_t c = 0; c < spec.columns.size(); ++c) {
        const ColumnSpec& column = spec.columns[c];
        const std::string_view stem = column.stem();
        if (name.substr(0, stem.size()) != stem) continue;
        for (const UnitChoice& u : unitsOf(column.quantity))
            if (name.substr(stem.size()) == u.suffix) return Match{static_cast<int>(c), u};
    }
    return std::nullopt;
}

std::string lowerCase(std::string_view s) {
    std::string out(s);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}

std::string_view trimmed(std::string_view s) {
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t')) s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t')) s.remove_suffix(1);
    return s;
}

std::string allowedColumns(const TableSpec& spec) {
    std::string out;
    for (const ColumnSpec& c : spec.columns) {
        if (!out.empty()) out += ", ";
        out += c.spellings();
    }
    return out;
}

/// The most helpful fix for a column name that matches nothing.
std::string unknownColumnFix(const TableSpec& spec, std::string_view name) {
    if (matchName(spec, lowerCase(name))) return "column names are lower case: write " + lowerCase(name);
    if (trimmed(name) != name && matchName(spec, trimmed(name)))
        return "remove the spaces around the name: " + std::string(trimmed(name));
    for (const ColumnSpec& c : spec.columns) {
        if (c.quantity == Quantity::Plain) continue;
        const std::string prefix = std::string(c.stem()) + "_";
        if (name.substr(0, prefix.size()) == prefix &&
            name.substr(prefix.size()).find('_') == std::string_view::npos)
            return "the unit '" + std::string(name.substr(prefix.size())) +
                   "' is not accepted; write " + c.spellings() + " and convert the values";
    }
    return "expected one of: " + allowedColumns(spec) +
           "; a free column of your own must have a name starting with x_";
}

} // namespace

TableHeader::TableHeader(const TableSpec& spec, const CsvRecord& header, std::string file,
                         ProblemList& problems)
    : spec_(&spec), file_(std::move(file)), names_(header.fields),
      field_of_column_(spec.columns.size(), -1), scale_of_column_(spec.columns.size()),
      unit_of_column_(spec.columns.size()) {
    resolve(problems, header.line);
    if (usable_) checkUnits(problems, header.line);
}

std::string TableHeader::writtenName(int column) const {
    const int field = fieldOf(column);
    if (field >= 0) return names_[static_cast<std::size_t>(field)];
    return std::string(spec_->columns[static_cast<std::size_t>(column)].name);
}

int TableHeader::columnNamed(std::string_view canonical) const {
    for (std::size_t c = 0; c < spec_->columns.size(); ++c)
        if (spec_->columns[c].name == canonical) return static_cast<int>(c);
    return -1;
}

void TableHeader::resolve(ProblemList& problems, std::size_t line) {
    const auto report = [&](std::size_t field, std::string problem, std::string fix) {
        InputProblem p;
        p.file = file_;
        p.line = line;
        p.column = names_[field];
        p.column_number = field + 1;
        p.problem = std::move(problem);
        p.fix = std::move(fix);
        problems.add(std::move(p));
        usable_ = false;
    };
    std::set<std::string_view> free_names;
    for (std::size_t field = 0; field < names_.size(); ++field) {
        const std::string& name = names_[field];
        if (name.empty()) {
            report(field, "empty column name",
                   "name the column (a free column's name starts with x_) or delete it");
            continue;
        }
        if (name.size() > 2 && name.compare(0, 2, "x_") == 0) {
            if (!free_names.insert(name).second)
                report(field, "duplicate column " + name, "keep one of the two columns");
            free_fields_.push_back(field);
            continue;
        }
        const auto match = matchName(*spec_, name);
        if (!match) {
            report(field, "unknown column " + name + " in " + file_,
                   unknownColumnFix(*spec_, name));
            continue;
        }
        const auto c = static_cast<std::size_t>(match->column);
        if (field_of_column_[c] >= 0) {
            const auto first = static_cast<std::size_t>(field_of_column_[c]);
            report(field,
                   name == names_[first]
                       ? "duplicate column " + name + " (also field " + std::to_string(first + 1) + ")"
                       : "duplicate column: " + name + " gives the same column as " + names_[first] +
                             " (field " + std::to_string(first + 1) + ")",
                   "keep one of the two columns");
            continue;
        }
        field_of_column_[c] = static_cast<int>(field);
        scale_of_column_[c] = match->unit.scale;
        unit_of_column_[c] = match->unit.suffix;
    }
    for (std::size_t c = 0; c < spec_->columns.size(); ++c) {
        const ColumnSpec& column = spec_->columns[c];
        if (!column.required || field_of_column_[c] >= 0) continue;
        InputProblem p;
        p.file = file_;
        p.line = line;
        p.column = std::string(column.name);
        p.problem = "missing required column " + column.spellings() + " in " + file_;
        p.fix = "add the column " + std::string(column.name) + " to the header row";
        problems.add(std::move(p));
        usable_ = false;
    }
}

void TableHeader::checkUnits(ProblemList& problems, std::size_t line) {
    for (const Quantity q : {Quantity::Length, Quantity::Age}) {
        std::optional<std::size_t> first; // column whose unit the others must share
        for (std::size_t c = 0; c < spec_->columns.size(); ++c) {
            if (spec_->columns[c].quantity != q || field_of_column_[c] < 0) continue;
            if (!first) {
                first = c;
                continue;
            }
            if (unit_of_column_[c] == unit_of_column_[*first]) continue;
            const auto field = static_cast<std::size_t>(field_of_column_[c]);
            const auto first_field = static_cast<std::size_t>(field_of_column_[*first]);
            const auto unitName = [&](std::size_t col) {
                for (const UnitChoice& u : unitsOf(q))
                    if (u.suffix == unit_of_column_[col]) return std::string(u.unit_name);
                return std::string();
            };
            InputProblem p;
            p.file = file_;
            p.line = line;
            p.column = names_[field];
            p.column_number = field + 1;
            const std::string stem(spec_->columns[c].stem());
            const bool is_sd = stem.size() > 3 && stem.compare(stem.size() - 3, 3, "_sd") == 0;
            if (q == Quantity::Age && is_sd) {
                p.problem = "the unit of " + names_[field] + " (" + unitName(c) +
                            ") does not match the unit of " + names_[first_field] + " (" +
                            unitName(*first) + ")";
                p.fix = "give the standard deviation in the unit of its age: " + stem +
                        std::string(unit_of_column_[*first]);
            } else {
                p.problem = "mixed units: " + names_[field] + " is in " + unitName(c) +
                            " but " + names_[first_field] + " is in " + unitName(*first);
                p.fix = q == Quantity::Length
                            ? "use one unit for every depth and length column of the file "
                              "(all _m or all _ft)"
                            : "use one unit for every age column of the file";
            }
            problems.add(std::move(p));
            usable_ = false;
        }
    }
}

} // namespace atollog::db::folder_io
