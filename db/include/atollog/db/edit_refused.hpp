#pragma once
// The exception a refused row edit throws: every problem the edit would have brought into the
// project, each with the table, the row's key, the field, the value and what to do, in the
// engine's wording (validateDataset) or, for a removal that would orphan rows, the db layer's.
#include <stdexcept>
#include <string>
#include <vector>

namespace atollog::db {

struct EditProblem {
    std::string table;   ///< "runs", "intervals", ... (the folder table names)
    std::string key;     ///< the row, e.g. "run 'KV-1-R2'" or "interval 1.25-2 m of hole 'KV-1'"
    std::string column;  ///< the field, e.g. "recovered_m"; "" for the whole row
    std::string value;   ///< the offending value as text; may be empty
    std::string problem;
    std::string fix;
    /// "runs: run 'KV-1-R2': column recovered_m, value '-1': <problem>; <fix>"
    std::string format() const;
};

/// Nothing was written: the project is as it was before the edit.
class EditRefused : public std::runtime_error {
  public:
    explicit EditRefused(std::vector<EditProblem> problems);
    const std::vector<EditProblem>& problems() const { return problems_; }

  private:
    std::vector<EditProblem> problems_;
};

} // namespace atollog::db
