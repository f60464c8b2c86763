// atollog-view: the correlation panel of a project on screen. `atollog-view [project]`.
#include "view/guarded_application.hpp"
#include "view/main_window.hpp"

#include <QCommandLineParser>
#include <QTimer>

int main(int argc, char *argv[]) {
    atollog::view::GuardedApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("atollog"));
    QApplication::setApplicationName(QStringLiteral("atollog-view"));
    QApplication::setApplicationVersion(QStringLiteral("0.1.0"));

    QCommandLineParser parser;
    parser.setApplicationDescription(
        QStringLiteral("Shows the correlation panel of an atollog project."));
    parser.addHelpOption();
    parser.addVersionOption();
    parser.addPositionalArgument(QStringLiteral("project"),
                                 QStringLiteral("The project file to open."), "[project]");
    parser.process(app);

    atollog::view::MainWindow window;
    window.show();
    if (!parser.positionalArguments().isEmpty()) {
        // Opened once the window is on screen, so a message box about a bad file has a parent
        // to sit on and the wait cursor shows.
        const QString path = parser.positionalArguments().front();
        QTimer::singleShot(0, &window, [&window, path] { window.openProject(path); });
    }
    return QApplication::exec();
}
