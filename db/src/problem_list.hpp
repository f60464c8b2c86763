#pragma once
// Collects the problems of a whole import so that the user sees all of them at once; keeps the
// message readable by listing at most kMaxListed and counting the rest.
#include "atollog/db/errors.hpp"

#include <cstddef>
#include <vector>

namespace atollog::db::folder_io {

class ProblemList {
  public:
    static constexpr std::size_t kMaxListed = 200;

    void add(InputProblem problem);
    void addAll(const std::vector<InputProblem>& problems);
    std::size_t count() const { return count_; }
    /// The listed problems, plus one closing line saying how many more were found.
    std::vector<InputProblem> listed() const;

  private:
    std::vector<InputProblem> listed_;
    std::size_t count_ = 0;
};

} // namespace atollog::db::folder_io
