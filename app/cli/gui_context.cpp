#include "cli/gui_context.hpp"

#include <QGuiApplication>

#include <cstdlib>
#include <iostream>

namespace atollog::cli {
namespace {

// Headless drawing makes Qt say things that mean nothing to a user of the command line (no
// runtime directory, no display). Only Qt's critical and fatal messages reach stderr.
void quietQtMessages(QtMsgType type, const QMessageLogContext&, const QString& message) {
    if (type == QtCriticalMsg || type == QtFatalMsg)
        std::cerr << "atollog: Qt: " << message.toStdString() << '\n';
}

} // namespace

void ensureGuiApplication() {
    if (QCoreApplication::instance()) return;
    if (!std::getenv("QT_QPA_PLATFORM")) ::setenv("QT_QPA_PLATFORM", "offscreen", 0);
    qInstallMessageHandler(quietQtMessages);
    // QGuiApplication keeps references to argc and argv: both must outlive it. The application
    // object itself is never destroyed: destroying it during static destruction, after Qt's own
    // globals are gone, crashes; the process ends right after the command anyway.
    static int argc = 1;
    static char name[] = "atollog";
    static char* argv[] = {name, nullptr};
    static QGuiApplication* app = new QGuiApplication(argc, argv);
    (void)app;
}

} // namespace atollog::cli
