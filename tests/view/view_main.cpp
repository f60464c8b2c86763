// Catch2 main for the viewer tests: widgets need a QApplication, and the tests must run without
// a display (offscreen platform), including when ctest lists them at build time. Settings go to
// Qt's test location, so a test run never touches a user's viewer settings.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#include "view/guarded_application.hpp"

#include <QApplication>
#include <QStandardPaths>

int main(int argc, char *argv[]) {
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) {
        qputenv("QT_QPA_PLATFORM", "offscreen");
    }
    // The viewer's own application class, so its error guard is what the tests run under;
    // caught errors go to stderr here instead of a modal box (test_guarded_application.cpp
    // sets its own sink).
    atollog::view::GuardedApplication app(argc, argv);
    app.setErrorSink([](const QString &text) { qWarning("%s", qPrintable(text)); });
    QApplication::setOrganizationName(QStringLiteral("atollog-tests"));
    QApplication::setApplicationName(QStringLiteral("view_tests"));
    QStandardPaths::setTestModeEnabled(true);
    return Catch::Session().run(argc, argv);
}
