#include "atollog/db/edit_refused.hpp"

namespace atollog::db {
namespace {

std::string listOf(const std::vector<EditProblem>& problems) {
    std::string text = "edit refused, the project is unchanged:";
    for (const EditProblem& p : problems) text += "\n  " + p.format();
    return text;
}

} // namespace

std::string EditProblem::format() const {
    std::string text = table + ": " + key + ": ";
    if (!column.empty()) text += "column " + column + ", ";
    if (!value.empty()) text += "value '" + value + "', ";
    // The engine's problem texts often begin with the row's name, which the key already gave.
    const std::string lead = key + ": ";
    text += problem.rfind(lead, 0) == 0 ? problem.substr(lead.size()) : problem;
    if (!fix.empty()) text += "; " + fix;
    return text;
}

EditRefused::EditRefused(std::vector<EditProblem> problems)
    : std::runtime_error(listOf(problems)), problems_(std::move(problems)) {}

} // namespace atollog::db
