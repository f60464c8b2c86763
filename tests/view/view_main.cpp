// Catch2 main for the viewer tests: widgets need a QApplication, and the tests must run without
// a display (offscreen platform), including when ctest lists them at build time. Settings go to
// Qt's test location, so a test run never touches a user's viewer settings.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#include <QApplication>
#include <QStandardPaths>

int main(int argc, char *argv[]) {
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) {
        qputenv("QT_QPA_PLATFORM", "offscreen");
    }
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("atollog-tests"));
    QApplication::setApplicationName(QStringLiteral("view_tests"));
    QStandardPaths::setTestModeEnabled(true);
    return Catch::Session().run(argc, argv);
}
