#pragma once
// Exceptions thrown at the db boundary. Each carries enough context to tell the user where the
// problem is and what to do; the CLI and the GUI turn them into messages and exit codes.
#include <stdexcept>
#include <string>
#include <vector>

namespace atollog::db {

/// One located problem in an input file: file, 1-based line and column, value, expectation.
struct InputProblem {
    std::string file;  ///< e.g. "runs.csv" (folder-relative)
    std::size_t line = 0;   ///< 1-based physical line where the record starts; 0 = whole file
    std::string column;     ///< header name, or "" for file-level problems
    std::size_t column_number = 0; ///< 1-based field position; 0 = unknown / whole line
    std::string value;
    std::string problem;    ///< what is wrong
    std::string fix;        ///< what is expected / how to fix
    bool is_warning = false;
    /// "runs.csv:12: column base_m (3): value '1O.5': not a number; expected a decimal number like 10.5"
    std::string format() const;
};

/// Bad input (folder or file): every problem found, errors first. what() lists them all.
class InputError : public std::runtime_error {
  public:
    explicit InputError(std::vector<InputProblem> problems);
    const std::vector<InputProblem>& problems() const { return problems_; }

  private:
    std::vector<InputProblem> problems_;
};

/// A project file that cannot be used: not SQLite, foreign, newer schema, damaged, hostile.
class ProjectError : public std::runtime_error {
  public:
    using std::runtime_error::runtime_error;
};

} // namespace atollog::db
