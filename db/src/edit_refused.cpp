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
    text += problem;
    if (!fix.empty()) text += "; " + fix;
    return text;
}

EditRefused::EditRefused(std::vector<EditProblem> problems)
    : std::runtime_error(listOf(problems)), problems_(std::move(problems)) {}

} // namespace atollog::db
