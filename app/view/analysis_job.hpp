#pragma once
// One analysis (datum picks, zones, composite sequence) run on a worker thread (BackgroundJob):
// its phases, the sequence's blocks of moves, Stop at the next of either; a stopped analysis
// stores nothing (storing is a phase of its own).
#include "view/analysis_request.hpp"
#include "view/background_job.hpp"

#include <QString>

namespace atollog::view {

class AnalysisJob : public JobWith<AnalysisResult> {
  public:
    AnalysisJob(const QString &project, const AnalysisRequest &request, QObject *parent = nullptr);
};

} // namespace atollog::view
