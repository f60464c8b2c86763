#include "view/analysis_job.hpp"

namespace atollog::view {

AnalysisJob::AnalysisJob(const QString &project, const AnalysisRequest &request, QObject *parent)
    : JobWith<AnalysisResult>(
          [path = project.toStdString(), request](const cli::PhaseReport &report,
                                                  const WorkProgress &step) {
              return runAnalysis(path, request, report, step);
          },
          parent) {}

} // namespace atollog::view
