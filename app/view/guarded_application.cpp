#include "view/guarded_application.hpp"

#include "view/exception_text.hpp"

#include <QMessageBox>

namespace atollog::view {

GuardedApplication::GuardedApplication(int &argc, char **argv) : QApplication(argc, argv) {}

bool GuardedApplication::notify(QObject *receiver, QEvent *event) {
    try {
        return QApplication::notify(receiver, event);
    } catch (...) {
        ++caught_;
        const QString text =
            tr("An operation failed and was abandoned; the project file holds every edit that "
               "was confirmed.\n\n%1")
                .arg(exceptionText());
        if (sink_) {
            sink_(text);
        } else if (!reporting_) {
            reporting_ = true;
            QMessageBox::critical(activeWindow(), tr("atollog-view"), text);
            reporting_ = false;
        }
        return false;
    }
}

} // namespace atollog::view
