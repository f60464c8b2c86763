#include "problem_list.hpp"

namespace atollog::db::folder_io {

void ProblemList::add(InputProblem problem) {
    ++count_;
    if (listed_.size() < kMaxListed) listed_.push_back(std::move(problem));
}

void ProblemList::addAll(const std::vector<InputProblem>& problems) {
    for (const auto& p : problems) add(p);
}

std::vector<InputProblem> ProblemList::listed() const {
    std::vector<InputProblem> out = listed_;
    if (count_ > listed_.size()) {
        InputProblem more;
        more.problem = "... and " + std::to_string(count_ - listed_.size()) +
                       " more problems not listed";
        more.fix = "fix the problems above and import again to see the rest";
        out.push_back(std::move(more));
    }
    return out;
}

} // namespace atollog::db::folder_io
