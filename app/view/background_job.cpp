#include "view/background_job.hpp"

#include "view/exception_text.hpp"

#include <QMetaObject>

namespace atollog::view {

BackgroundJob::~BackgroundJob() { stopAndJoin(); }

void BackgroundJob::stopAndJoin() {
    stop_ = true;
    if (worker_.joinable()) {
        worker_.join();
    }
}

void BackgroundJob::start() {
    worker_ = std::thread([this] { run(); });
}

void BackgroundJob::run() {
    // Signals cross to the GUI thread as queued calls; once this object is deleted (after the
    // join in the destructor) Qt drops calls still queued for it.
    const auto report = [this](const std::string &text) {
        const QString q = QString::fromStdString(text);
        QMetaObject::invokeMethod(this, [this, q] { emit phase(q); }, Qt::QueuedConnection);
        return !stop_.load();
    };
    const auto step = [this](std::size_t done, std::size_t total) {
        const int d = static_cast<int>(done), t = static_cast<int>(total);
        QMetaObject::invokeMethod(this, [this, d, t] { emit progressed(d, t); },
                                  Qt::QueuedConnection);
        return !stop_.load();
    };
    try {
        compute(report, step);
        QMetaObject::invokeMethod(this, [this] { emit finished(); }, Qt::QueuedConnection);
    } catch (const cli::AnalysisStopped &) {
        QMetaObject::invokeMethod(this, [this] { emit cancelled(); }, Qt::QueuedConnection);
    } catch (...) {
        const QString message = exceptionText();
        QMetaObject::invokeMethod(this, [this, message] { emit failed(message); },
                                  Qt::QueuedConnection);
    }
}

} // namespace atollog::view
