#pragma once
// A computation of the viewer run on a worker thread (a figure, an analysis): the window stays
// live, hears each phase and, where the engine reports them, the blocks of the current phase,
// and can stop the work at the next phase or block. What a stopped job would have stored is
// never stored: storing is a phase of its own. Signals reach the GUI thread as queued calls.
#include "cli/phase_report.hpp"

#include "atollog/engine/work_progress.hpp"

#include <QObject>
#include <QString>

#include <atomic>
#include <functional>
#include <mutex>
#include <optional>
#include <thread>
#include <utility>

namespace atollog::view {

class BackgroundJob : public QObject {
    Q_OBJECT

  public:
    explicit BackgroundJob(QObject *parent = nullptr) : QObject(parent) {}
    /// Derived classes call stopAndJoin() in their own destructor, before their members go.
    ~BackgroundJob() override;

    void start();
    void cancel() { stop_ = true; }

  signals:
    void phase(const QString &text);
    /// `done` of `total` blocks of the current phase (a new phase starts unknown).
    void progressed(int done, int total);
    void finished();
    void failed(const QString &message);
    void cancelled();

  protected:
    /// Runs on the worker thread; throws cli::AnalysisStopped when a report says stop.
    virtual void compute(const cli::PhaseReport &report, const WorkProgress &step) = 0;
    /// Asks the work to stop and waits for the thread.
    void stopAndJoin();

  private:
    void run();

    std::atomic<bool> stop_{false};
    std::thread worker_;
};

/// A job whose work returns a Result, taken by the window once finished() was emitted.
template <class Result> class JobWith : public BackgroundJob {
  public:
    using Work = std::function<Result(const cli::PhaseReport &, const WorkProgress &)>;
    explicit JobWith(Work work, QObject *parent = nullptr)
        : BackgroundJob(parent), work_(std::move(work)) {}
    ~JobWith() override { stopAndJoin(); }

    std::optional<Result> takeResult() {
        const std::lock_guard lock(result_mutex_);
        return std::exchange(result_, std::nullopt);
    }

  protected:
    void compute(const cli::PhaseReport &report, const WorkProgress &step) override {
        Result r = work_(report, step);
        const std::lock_guard lock(result_mutex_);
        result_ = std::move(r);
    }

  private:
    Work work_;
    std::mutex result_mutex_;
    std::optional<Result> result_;
};

} // namespace atollog::view
