// The window driven like a user would: flatten, hide events, reorder holes, switch the axis,
// export, and a bad project path, with the panel built by hand (sample_panel.hpp).
#include "canvas_fixture.hpp"

#include "view/axis_readout.hpp"
#include "view/main_window.hpp"
#include "view/side_pane.hpp"

#include <QAction>
#include <QComboBox>
#include <QFile>
#include <QListWidget>
#include <QTemporaryDir>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;
using Catch::WithinAbs;

namespace {

struct Messages {
    QStringList titles, texts;
    MessageSink sink() {
        return [this](const QString &title, const QString &text) {
            titles << title;
            texts << text;
        };
    }
};

struct ShownWindow {
    Messages messages;
    MainWindow window;
    ShownWindow() {
        window.setMessageSink(messages.sink());
        window.resize(1200, 800);
        window.show();
        REQUIRE(QTest::qWaitForWindowExposed(&window));
        const draw::PanelInput full = samplePanel();
        window.showPanel(full, showEverything(full));
    }
    const PanelScene &scene() const { return window.canvas()->scene(); }
};

/// The y of every line joining two columns for this tie, bars at the column edges left out.
std::vector<double> tieLineEndsY(const draw::DisplayList &list, const std::string &event) {
    std::vector<double> ys;
    for (const draw::DisplayItem *item : list.withRole(draw::ItemRole::TieLine)) {
        const auto *line = std::get_if<draw::Line>(item);
        if (line && line->tag.key == event && std::fabs(line->to.x_mm - line->from.x_mm) > 2.0) {
            ys.push_back(line->from.y_mm);
            ys.push_back(line->to.y_mm);
        }
    }
    return ys;
}

double spread(const std::vector<double> &v) {
    const auto [lo, hi] = std::minmax_element(v.begin(), v.end());
    return *hi - *lo;
}

} // namespace

TEST_CASE("flattening chosen in the window puts the tie on one level", "[view][window]") {
    ShownWindow w;
    const std::vector<double> plain = tieLineEndsY(w.scene().list, "B ALPHA");
    REQUIRE(plain.size() == 4); // AX1-AX2 and AX2-AX3
    CHECK(spread(plain) > 1.0); // levels 12.3, 10.1, 14.0 m differ on a depth axis

    QComboBox *flatten = w.window.flattenCombo();
    const int index = flatten->findData(QStringLiteral("B ALPHA"));
    REQUIRE(index > 0);
    flatten->setCurrentIndex(index);

    REQUIRE(w.window.panelView().flatten_on == std::optional<std::string>("B ALPHA"));
    const std::vector<double> flat = tieLineEndsY(w.scene().list, "B ALPHA");
    REQUIRE(flat.size() == 4);
    CHECK_THAT(spread(flat), WithinAbs(0.0, 1e-9)); // mm
    // Every column's level of the event is at that one y.
    const auto &in = w.window.shownInput();
    for (const auto &at : in.ties[0].at) {
        CHECK_THAT(draw::panelY_mm(w.scene().geometry, at.column, at.level_m),
                   WithinAbs(flat.front(), 1e-9));
    }
    CHECK(w.messages.texts.isEmpty());
}

TEST_CASE("unticking an event takes its tie lines away", "[view][window]") {
    ShownWindow w;
    REQUIRE_FALSE(w.scene().list.withRole(draw::ItemRole::TieLine).empty());
    QListWidget *events = w.window.sidePane()->eventList();
    const auto found = events->findItems(QStringLiteral("T BETA"), Qt::MatchExactly);
    REQUIRE(found.size() == 1);
    CHECK(joiningLine(w.scene().list, draw::ItemRole::TieLine, "T BETA") != nullptr);
    found.front()->setCheckState(Qt::Unchecked);
    CHECK(joiningLine(w.scene().list, draw::ItemRole::TieLine, "T BETA") == nullptr);
    CHECK(joiningLine(w.scene().list, draw::ItemRole::TieLine, "B ALPHA") != nullptr);
    CHECK(w.window.flattenCombo()->findData(QStringLiteral("T BETA")) < 0);
}

TEST_CASE("a header dragged in the window reorders the holes", "[view][window]") {
    ShownWindow w;
    PanelCanvas *canvas = w.window.canvas();
    const draw::PanelGeometry &g = canvas->scene().geometry;
    const auto centre = [&](std::size_t c) {
        return g.column_boxes[c].left_mm + g.column_boxes[c].width_mm / 2;
    };
    const QPoint header = canvas->transform()
                              .toWidget(draw::PointMm{centre(2), g.column_boxes[2].top_mm + 2.0})
                              .toPoint();
    const int to_first =
        static_cast<int>((centre(0) - centre(2) - 5.0) * canvas->transform().pxPerMm());
    dragMouse(canvas, header, header + QPoint(to_first, 0));

    REQUIRE(w.window.shownInput().columns.size() == 3);
    CHECK(w.window.shownInput().columns[0].hole == "AX3");
    CHECK(w.window.shownInput().columns[1].hole == "AX1");
    CHECK(w.window.sidePane()->holeList()->item(0)->text() == QStringLiteral("AX3"));
    CHECK(canvas->scene().holes.front() == "AX3");
}

TEST_CASE("the elevation axis shifts each column by its collar", "[view][window]") {
    ShownWindow w;
    w.window.elevationAction()->trigger();
    REQUIRE(w.window.panelView().axis == draw::PanelAxis::Elevation);
    const auto &offsets = w.scene().geometry.column_offset_m;
    REQUIRE(offsets.size() == 3);
    CHECK_THAT(offsets[1], WithinAbs(-4.5, 1e-12)); // AX2's collar is 4.5 m above sea level
    CHECK(w.scene().axis == draw::PanelAxis::Elevation);
}

TEST_CASE("selecting a tie shows its levels in the side pane", "[view][window]") {
    ShownWindow w;
    PanelCanvas *canvas = w.window.canvas();
    const draw::Line *tie = joiningLine(canvas->scene().list, draw::ItemRole::TieLine, "B ALPHA");
    REQUIRE(tie != nullptr);
    QTest::mouseClick(canvas, Qt::LeftButton, Qt::NoModifier, midpointPx(*canvas, *tie).toPoint());
    const QString details = w.window.sidePane()->details();
    CHECK(details.contains(QStringLiteral("B ALPHA")));
    CHECK(details.contains(QStringLiteral("AX2: 10.10 m, bracket 9.00-10.50 m")));

    // A relayout keeps the selected datum; hiding it clears the selection and its details.
    w.window.flattenCombo()->setCurrentIndex(
        w.window.flattenCombo()->findData(QStringLiteral("T BETA")));
    REQUIRE(canvas->selectedItem().has_value());
    CHECK(draw::itemTag(canvas->scene().list.items()[*canvas->selectedItem()]).key == "B ALPHA");
    CHECK(w.window.sidePane()->details() == details);
    w.window.sidePane()
        ->eventList()
        ->findItems(QStringLiteral("B ALPHA"), Qt::MatchExactly)
        .front()
        ->setCheckState(Qt::Unchecked);
    CHECK_FALSE(canvas->selectedItem().has_value());
    CHECK_FALSE(w.window.sidePane()->details().contains(QStringLiteral("B ALPHA")));
}

TEST_CASE("a bad project path gives a message, not a crash", "[view][window]") {
    ShownWindow w;
    const QString path = QStringLiteral("/nonexistent/folder/nothing.atollog");
    CHECK_FALSE(w.window.openProject(path));
    REQUIRE(w.messages.texts.size() == 1);
    CHECK(w.messages.titles[0].contains(QStringLiteral("open")));
    CHECK(w.messages.texts[0].contains(path));
    // The panel shown before stays.
    CHECK(w.window.shownInput().columns.size() == 3);

    QTemporaryDir dir;
    const QString junk = dir.filePath(QStringLiteral("junk.atollog"));
    QFile file(junk);
    REQUIRE(file.open(QIODevice::WriteOnly));
    file.write("not a project at all");
    file.close();
    CHECK_FALSE(w.window.openProject(junk));
    CHECK(w.messages.texts.size() == 2);
}

TEST_CASE("export writes the panel as shown", "[view][window]") {
    ShownWindow w;
    QTemporaryDir dir;
    const QString svg = dir.filePath(QStringLiteral("panel.svg"));
    REQUIRE(w.window.exportTo(svg, draw::PdfPageSize::FitChart, 150));
    QFile file(svg);
    REQUIRE(file.open(QIODevice::ReadOnly));
    const QByteArray bytes = file.readAll();
    CHECK(bytes.contains("<svg"));
    CHECK(bytes.contains("B ALPHA"));

    CHECK_FALSE(w.window.exportTo(dir.filePath(QStringLiteral("panel.txt")),
                                  draw::PdfPageSize::FitChart, 150));
    CHECK(w.messages.texts.size() == 1);
}

TEST_CASE("the age axis stands equal ages level and refuses flattening", "[view][window]") {
    Messages messages;
    MainWindow window;
    window.setMessageSink(messages.sink());
    window.resize(1200, 800);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    draw::PanelInput full = samplePanel();
    // AX1 accumulates 0.02 Myr per metre, AX3 0.01: 0.4 Ma lies at 20 m and 40 m. AX2 has no
    // model and keeps only its header.
    full.columns[0].age_model.rows = {{0.0, 0.0, 0.0, 0.01}, {40.0, 0.75, 0.8, 0.85}};
    full.columns[2].age_model.rows = {{0.0, 0.0, 0.0, 0.01}, {44.0, 0.42, 0.44, 0.46}};
    window.showPanel(full, showEverything(full));

    window.ageAction()->trigger();
    REQUIRE(window.panelView().axis == draw::PanelAxis::Age);
    CHECK_FALSE(window.flattenCombo()->isEnabled());
    CHECK_FALSE(window.panelView().flatten_on.has_value());
    const PanelScene &scene = window.canvas()->scene();
    REQUIRE(messages.texts.isEmpty());
    const auto &g = scene.geometry;
    CHECK_THAT(draw::panelY_mm(g, 0, 20.0), WithinAbs(draw::panelY_mm(g, 2, 40.0), 1e-9));
    CHECK_FALSE(g.column_scales[1].has_value());
    // The cursor readout gives the age on the axis and the depth in the hole under it.
    const double y = draw::panelY_mm(g, 2, 40.0);
    const QString readout = axisReadout(
        scene, draw::PointMm{(g.lithology_left_mm[2] + g.lithology_right_mm[2]) / 2, y});
    CHECK(readout.contains(QStringLiteral("age 0.400 Ma")));
    CHECK(readout.contains(QStringLiteral("AX3: 40.00 m below collar")));

    window.depthAction()->trigger();
    CHECK(window.flattenCombo()->isEnabled());
}
