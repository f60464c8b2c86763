#pragma once
// What every window that runs a BackgroundJob shows of it: the start button and Stop enabled by
// turns, a bar that is busy between phases and
// determinate while a phase reports its blocks, and a status line with the phase, the failure
// (in red) or "Stopped; nothing was stored." One job at a time.
#include <QElapsedTimer>
#include <QObject>
#include <QString>

class QLabel;
class QProgressBar;
class QPushButton;
class QVBoxLayout;
class QWidget;

namespace atollog::view {

class BackgroundJob;

class JobControls : public QObject {
    Q_OBJECT

  public:
    /// The widgets are children of `window`; `start_text` names the start button ("&Draw").
    JobControls(const QString &start_text, QWidget *window);
    ~JobControls() override;

    /// Adds the buttons (start, Stop, then `beside` on the right when given), the bar and the
    /// status line to `layout`.
    void addTo(QVBoxLayout *layout, QWidget *beside = nullptr);
    QPushButton *startButton() const { return start_; }
    QPushButton *stopButton() const { return stop_; }
    QProgressBar *bar() const { return bar_; }
    QLabel *statusLabel() const { return status_; }

    bool busy() const { return job_ != nullptr; }
    /// Starts `job` and owns it (deleted once it ended); false (job deleted, the status says
    /// why) when one is running. Connect to the job's finished() before, to take its result.
    /// A failure shows as "<failed_lead>: <message>".
    bool run(BackgroundJob *job, const QString &failed_lead);
    /// Asks the running job to stop at its next phase or block.
    void stop();
    /// Seconds since the running (or last) job started.
    double elapsedSeconds() const { return static_cast<double>(clock_.elapsed()) / 1000.0; }
    void setStatus(const QString &text, bool problem);

  signals:
    /// The job ended: finished, failed or stopped (after the window's own finished handler).
    void jobEnded();

  private:
    void endJob();

    QPushButton *start_;
    QPushButton *stop_;
    QProgressBar *bar_;
    QLabel *status_;
    BackgroundJob *job_ = nullptr;
    QElapsedTimer clock_;
};

} // namespace atollog::view
