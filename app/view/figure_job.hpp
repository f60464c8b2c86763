#pragma once
// One figure computed on a worker thread: the window stays live, shows each phase and how far
// an age model's draws are, and can stop the work. Stopping takes effect at the next phase or
// the next block of an age model's draws (512 draws, or one leave-one-out run), and nothing of
// a stopped job is stored: the store step is a phase of its own.
#include "view/figure_request.hpp"

#include <QObject>
#include <QString>

#include <atomic>
#include <memory>
#include <mutex>
#include <optional>
#include <thread>

namespace atollog::view {

class FigureJob : public QObject {
    Q_OBJECT

  public:
    FigureJob(QString project, FigureRequest request, std::shared_ptr<AgeModelCache> cache,
              QObject *parent = nullptr);
    /// Asks the work to stop and waits for the thread.
    ~FigureJob() override;

    void start();
    void cancel() { stop_ = true; }
    /// The figure, once finished() was emitted.
    std::optional<FigureResult> takeResult();

  signals:
    void phase(const QString &text);
    /// `done` of `total` blocks of the current phase's age model (a new phase starts unknown).
    void progressed(int done, int total);
    void finished();
    void failed(const QString &message);
    void cancelled();

  private:
    void run();

    QString project_;
    FigureRequest request_;
    std::shared_ptr<AgeModelCache> cache_;
    std::atomic<bool> stop_{false};
    std::mutex result_mutex_;
    std::optional<FigureResult> result_;
    std::thread worker_;
};

} // namespace atollog::view
