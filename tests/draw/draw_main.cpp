// Catch2 main for the drawing tests: painting text needs a QGuiApplication (QFontDatabase), and
// the tests must run without a display, including when ctest lists them at build time.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#include <QGuiApplication>

int main(int argc, char *argv[]) {
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) {
        qputenv("QT_QPA_PLATFORM", "offscreen");
    }
    QGuiApplication app(argc, argv);
    return Catch::Session().run(argc, argv);
}
