#pragma once
// One figure computed on a worker thread (BackgroundJob): its phases, the blocks of an age
// model's draws, Stop at the next of either; nothing of a stopped figure is stored.
#include "view/background_job.hpp"
#include "view/figure_request.hpp"

#include <QString>

#include <memory>

namespace atollog::view {

class FigureJob : public JobWith<FigureResult> {
  public:
    FigureJob(const QString &project, const FigureRequest &request,
              std::shared_ptr<AgeModelCache> cache, QObject *parent = nullptr);
};

} // namespace atollog::view
