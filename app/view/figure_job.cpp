#include "view/figure_job.hpp"

namespace atollog::view {

FigureJob::FigureJob(const QString &project, const FigureRequest &request,
                     std::shared_ptr<AgeModelCache> cache, QObject *parent)
    : JobWith<FigureResult>(
          [path = project.toStdString(), request, cache = std::move(cache)](
              const cli::PhaseReport &report, const WorkProgress &step) {
              return makeFigure(path, request, *cache, report, step);
          },
          parent) {}

} // namespace atollog::view
