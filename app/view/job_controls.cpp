#include "view/job_controls.hpp"

#include "view/background_job.hpp"

#include <QHBoxLayout>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QVBoxLayout>

namespace atollog::view {

JobControls::JobControls(const QString &start_text, QWidget *window)
    : QObject(window), start_(new QPushButton(start_text, window)),
      stop_(new QPushButton(tr("&Stop"), window)), bar_(new QProgressBar(window)),
      status_(new QLabel(window)) {
    start_->setDefault(true);
    stop_->setEnabled(false);
    bar_->setRange(0, 0); // busy until a phase says how long it is
    bar_->setVisible(false);
    status_->setWordWrap(true);
    status_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    connect(stop_, &QPushButton::clicked, this, &JobControls::stop);
}

JobControls::~JobControls() { delete job_; }

void JobControls::addTo(QVBoxLayout *layout, QWidget *beside) {
    auto *buttons = new QHBoxLayout;
    buttons->addWidget(start_);
    buttons->addWidget(stop_);
    buttons->addStretch(1);
    if (beside) {
        buttons->addWidget(beside);
    }
    layout->addLayout(buttons);
    layout->addWidget(bar_);
    layout->addWidget(status_);
}

bool JobControls::run(BackgroundJob *job, const QString &failed_lead) {
    if (job_ != nullptr) {
        delete job;
        setStatus(tr("A job is running: wait for it or stop it first."), true);
        return false;
    }
    job_ = job;
    clock_.start();
    connect(job, &BackgroundJob::phase, this, [this](const QString &text) {
        bar_->setRange(0, 0); // a new phase: busy until it reports its length
        setStatus(text + QStringLiteral("..."), false);
    });
    connect(job, &BackgroundJob::progressed, this, [this](int done, int total) {
        bar_->setRange(0, total);
        bar_->setValue(done);
    });
    connect(job, &BackgroundJob::finished, this, [this] {
        endJob(); // the window's handler, connected first, has taken the result
        emit jobEnded();
    });
    connect(job, &BackgroundJob::failed, this, [this, failed_lead](const QString &message) {
        endJob();
        setStatus(tr("%1: %2").arg(failed_lead, message), true);
        emit jobEnded();
    });
    connect(job, &BackgroundJob::cancelled, this, [this] {
        endJob();
        setStatus(tr("Stopped; nothing was stored."), false);
        emit jobEnded();
    });
    start_->setEnabled(false);
    stop_->setEnabled(true);
    bar_->setVisible(true);
    setStatus(tr("Starting..."), false);
    job->start();
    return true;
}

void JobControls::stop() {
    if (job_ != nullptr) {
        job_->cancel();
        stop_->setEnabled(false);
        setStatus(tr("Stopping at the next step..."), false);
    }
}

void JobControls::endJob() {
    job_->deleteLater();
    job_ = nullptr;
    start_->setEnabled(true);
    stop_->setEnabled(false);
    bar_->setVisible(false);
    bar_->setRange(0, 0);
}

void JobControls::setStatus(const QString &text, bool problem) {
    status_->setStyleSheet(problem ? QStringLiteral("color: #B00020;") : QString());
    status_->setText(text);
}

} // namespace atollog::view
