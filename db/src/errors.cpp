#include "atollog/db/errors.hpp"

#include "utf8_check.hpp"

#include <algorithm>

namespace atollog::db {
namespace {

// A message is one line per problem, so control characters in a value are shown escaped and
// long values are cut: the user needs to recognise the cell, not to read all of it.
constexpr std::size_t kMaxShownValueBytes = 80;

void appendHexByte(std::string& out, unsigned char c) {
    static constexpr char kHex[] = "0123456789ABCDEF";
    out += "\\x";
    out += kHex[c >> 4];
    out += kHex[c & 0xF];
}

std::string printableValue(const std::string& value) {
    std::string out;
    std::size_t shown = 0;
    for (std::size_t i = 0; i < value.size(); ++i) {
        if (shown >= kMaxShownValueBytes) {
            // Do not cut inside a UTF-8 sequence: continuation bytes are 10xxxxxx.
            while (i < value.size() && (static_cast<unsigned char>(value[i]) & 0xC0) == 0x80)
                out += value[i++];
            if (i < value.size()) out += "...";
            break;
        }
        const auto c = static_cast<unsigned char>(value[i]);
        if (c == '\n') {
            out += "\\n";
        } else if (c == '\r') {
            out += "\\r";
        } else if (c == '\t') {
            out += "\\t";
        } else if (c >= 0x80) {
            // Copy a well-formed UTF-8 character whole; show a stray byte as \xNN so the
            // message itself stays valid UTF-8.
            const std::size_t len = c >= 0xF0 ? 4 : c >= 0xE0 ? 3 : 2;
            const std::string_view seq = std::string_view(value).substr(i, len);
            if (seq.size() == len && folder_io::firstInvalidUtf8(seq) == std::string_view::npos) {
                out += seq;
                i += len - 1;
            } else {
                appendHexByte(out, c);
            }
        } else if (c < 0x20 || c == 0x7F) {
            appendHexByte(out, c);
        } else {
            out += static_cast<char>(c);
        }
        ++shown;
    }
    return out;
}

std::string listProblems(const std::vector<InputProblem>& problems) {
    std::size_t errors = 0;
    for (const auto& p : problems)
        if (!p.is_warning) ++errors;
    std::string out = "the input has " + std::to_string(errors) +
                      (errors == 1 ? " error" : " errors");
    if (problems.size() > errors)
        out += " and " + std::to_string(problems.size() - errors) +
               (problems.size() - errors == 1 ? " warning" : " warnings");
    out += ":";
    for (const auto& p : problems) {
        out += "\n  ";
        out += p.format();
    }
    return out;
}

std::vector<InputProblem> errorsFirst(std::vector<InputProblem> problems) {
    std::stable_partition(problems.begin(), problems.end(),
                          [](const InputProblem& p) { return !p.is_warning; });
    return problems;
}

} // namespace

// Layout: "<file>:<line>: column <name> (<n>): value '<v>': <problem>; <fix>"; each part is
// left out when not known, and warnings start with "warning: ".
std::string InputProblem::format() const {
    std::string out;
    if (is_warning) out += "warning: ";
    if (!file.empty()) {
        out += file;
        if (line > 0) out += ":" + std::to_string(line);
        out += ": ";
    }
    if (!column.empty()) {
        out += "column " + column;
        if (column_number > 0) out += " (" + std::to_string(column_number) + ")";
        out += ": ";
    } else if (column_number > 0) {
        out += "field " + std::to_string(column_number) + ": ";
    }
    if (!value.empty()) out += "value '" + printableValue(value) + "': ";
    out += problem;
    if (!fix.empty()) out += "; " + fix;
    return out;
}

InputError::InputError(std::vector<InputProblem> problems)
    : std::runtime_error(listProblems(errorsFirst(problems))),
      problems_(errorsFirst(std::move(problems))) {}

} // namespace atollog::db
