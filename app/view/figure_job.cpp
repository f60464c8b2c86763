#include "view/figure_job.hpp"

#include "view/exception_text.hpp"

#include <QMetaObject>

namespace atollog::view {

FigureJob::FigureJob(QString project, FigureRequest request, std::shared_ptr<AgeModelCache> cache,
                     QObject *parent)
    : QObject(parent), project_(std::move(project)), request_(std::move(request)),
      cache_(std::move(cache)) {}

FigureJob::~FigureJob() {
    stop_ = true;
    if (worker_.joinable()) {
        worker_.join();
    }
}

void FigureJob::start() {
    worker_ = std::thread([this] { run(); });
}

std::optional<FigureResult> FigureJob::takeResult() {
    const std::lock_guard lock(result_mutex_);
    return std::exchange(result_, std::nullopt);
}

void FigureJob::run() {
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
        FigureResult r = makeFigure(project_.toStdString(), request_, *cache_, report, step);
        {
            const std::lock_guard lock(result_mutex_);
            result_ = std::move(r);
        }
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
