// The demo archipelago imported through the command line library, opened in the window. The
// hidden "[.look]" case writes a screenshot to $TMPDIR/view.png (default /tmp) for a look.
#include "cli/cli_runner.hpp"

#include "view/main_window.hpp"
#include "view/panel_canvas.hpp"
#include "view/project_panel.hpp"
#include "view/side_pane.hpp"

#include <QAction>
#include <QApplication>
#include <QComboBox>
#include <QDir>
#include <QListWidget>
#include <QTest>
#include <QWheelEvent>

#include <catch2/catch.hpp>

using namespace atollog;

namespace {

/// One import for all cases of this file: importing runs the whole validation.
const std::filesystem::path &demoProject() {
    static test::TempDir dir("view-demo");
    static const std::filesystem::path project = [] {
        const auto p = dir / "demo.atollog";
        const auto r = test::runAtollog(
            {"import", p.string(), std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago"});
        REQUIRE(r.exit_code == 0);
        return p;
    }();
    return project;
}

struct DemoWindow {
    QStringList messages;
    view::MainWindow window;
    DemoWindow() {
        window.setMessageSink(
            [this](const QString &title, const QString &text) { messages << title + ": " + text; });
        window.resize(1400, 900);
        window.show();
        REQUIRE(QTest::qWaitForWindowExposed(&window));
        REQUIRE(window.openProject(QString::fromStdString(demoProject().string())));
        INFO(messages.join('\n').toStdString());
        REQUIRE(messages.isEmpty());
    }
};

} // namespace

TEST_CASE("isochron candidates step on the 1-2-5 series", "[view][demo]") {
    CHECK(view::isochronAges(4.5) ==
          std::vector<double>{0.5, 1.0, 1.5, 2.0, 2.5, 3.0, 3.5, 4.0, 4.5});
    CHECK(view::isochronAges(0.0).empty());
    CHECK(view::isochronAges(25.0).size() == 5); // every 5 Ma
}

TEST_CASE("the demo project opens with every hole and its default ties", "[view][demo]") {
    DemoWindow w;
    const auto &shown = w.window.shownInput();
    CHECK(shown.columns.size() == 4);
    CHECK_FALSE(shown.ties.empty());
    CHECK(w.window.sidePane()->eventList()->count() >= static_cast<int>(shown.ties.size()));
    const auto &list = w.window.canvas()->scene().list;
    CHECK_FALSE(list.withRole(draw::ItemRole::TieLine).empty());
    CHECK_FALSE(list.withRole(draw::ItemRole::LithologyInterval).empty());
}

TEST_CASE("screenshot of the demo project", "[.look]") {
    DemoWindow w;
    const QString path = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                             .filePath(QStringLiteral("view.png"));
    REQUIRE(w.window.grab().save(path));
    WARN("screenshot: " << path.toStdString());

    // A closer look at the tie lines between the first two holes, one of them selected.
    view::PanelCanvas *canvas = w.window.canvas();
    const auto &g = canvas->scene().geometry;
    const QPointF between = canvas->transform().toWidget(draw::PointMm{
        (g.link_out_mm[0] + g.lithology_left_mm[1]) / 2, g.axis_origin_y_mm + 20.0});
    for (int i = 0; i < 3; ++i) {
        QWheelEvent wheel(between, canvas->mapToGlobal(between), QPoint(), QPoint(0, 120),
                          Qt::NoButton, Qt::NoModifier, Qt::NoScrollPhase, false);
        QApplication::sendEvent(canvas, &wheel);
    }
    const auto ties = canvas->scene().list.withRole(draw::ItemRole::TieLine);
    REQUIRE_FALSE(ties.empty());
    const draw::RectMm box = draw::itemBounds(*ties.front());
    QTest::mouseClick(
        canvas, Qt::LeftButton, Qt::NoModifier,
        canvas->transform()
            .toWidget(draw::PointMm{box.left_mm + box.width_mm / 2, box.top_mm + box.height_mm / 2})
            .toPoint());
    const QString zoomed = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                               .filePath(QStringLiteral("view-zoom.png"));
    REQUIRE(w.window.grab().save(zoomed));
    WARN("zoomed: " << zoomed.toStdString());

    // Flattened on the first tie offered, on the elevation axis, fitted.
    QComboBox *flatten = w.window.flattenCombo();
    REQUIRE(flatten->count() > 1);
    flatten->setCurrentIndex(1);
    w.window.elevationAction()->trigger();
    canvas->fitToWindow();
    const QString flat = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                             .filePath(QStringLiteral("view-flat.png"));
    REQUIRE(w.window.grab().save(flat));
    WARN("flattened: " << flat.toStdString());
}
