// The viewer's figures: each kind drawn from the demo project by the same code as the
// commands' --plot (an exported SVG is byte for byte the command's), age models stored once
// with their provenance and reused, and a stopped job stores nothing, also when stopped in the
// middle of an age model's draws.
#include "imported_demo.hpp"
#include "cli/cli_runner.hpp"

#include "view/figure_request.hpp"
#include "view/figure_window.hpp"
#include "view/main_window.hpp"
#include "view/panel_canvas.hpp"

#include "atollog/db/project_store.hpp"

#include <QCheckBox>
#include <QComboBox>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QSignalSpy>
#include <QSpinBox>
#include <QTest>

#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>

using namespace atollog;
using namespace atollog::view::test;
using view::FigureKind;

namespace {

/// The demo's usual model options (run-demo.sh), few draws to keep the tests quick.
view::FigureRequest demoRequest(FigureKind kind, const std::string &hole = "KAL1",
                                const std::string &with = "") {
    view::FigureRequest r;
    r.kind = kind;
    r.hole = hole;
    r.with_hole = with;
    r.model.biostrat.extend = 0.95;
    r.model.biostrat.ties_extended = true;
    r.model.core_top_open = true;
    r.model.draws = 2000;
    r.model.outlier_draws = 200;
    return r;
}

bool hasRole(const draw::DisplayList &list, draw::ItemRole role) {
    return !list.withRole(role).empty();
}

} // namespace

TEST_CASE("Every figure kind draws from the demo project", "[view][figures]") {
    ImportedDemo demo;
    view::AgeModelCache cache;
    const std::vector<std::pair<view::FigureRequest, draw::ItemRole>> cases{
        {demoRequest(FigureKind::RangeChart, "TOR1"), draw::ItemRole::TaxonRangeBar},
        {demoRequest(FigureKind::RatesDepth, "TOR1"), draw::ItemRole::RateBar},
        {demoRequest(FigureKind::RatesAge, "TOR1"), draw::ItemRole::RateBar},
        {demoRequest(FigureKind::Subsidence), draw::ItemRole::SubsidencePoint},
        {demoRequest(FigureKind::Line, "OSS1", "PEL1"), draw::ItemRole::LocEventMarker},
        {demoRequest(FigureKind::Chain), draw::ItemRole::ChainPoint},
    };
    for (const auto &[request, role] : cases) {
        INFO(view::figureKindName(request.kind));
        const view::FigureResult r = view::makeFigure(demo.project, request, cache);
        CHECK_FALSE(r.title.empty());
        CHECK(hasRole(r.list, role));
    }
}

TEST_CASE("An exported age-depth figure is the command's --plot, byte for byte",
          "[view][figures]") {
    ImportedDemo demo;
    const auto cli_svg = demo.dir / "cli.svg";
    const auto r = atollog::test::runAtollog({"age", demo.project.string(), "--hole", "KAL1", "--extend",
                                     "0.95", "--ties-extended", "--core-top-open", "--draws",
                                     "2000", "--plot", cli_svg.string(), "--no-store"});
    REQUIRE(r.exit_code == 0);

    view::FigureWindow window;
    window.setProject(QString::fromStdString(demo.project.string()), {"KAL1", "TOR1"});
    window.kindCombo()->setCurrentText("Age against depth");
    window.holeCombo()->setCurrentText("KAL1");
    window.drawsBox()->setValue(2000);
    QSignalSpy ended(&window, &view::FigureWindow::jobEnded);
    REQUIRE(window.draw());
    REQUIRE(ended.wait(120000));
    INFO(window.statusLabel()->text().toStdString());
    REQUIRE(window.shownTitle() == "Age-depth model, hole KAL1");
    CHECK(window.statusLabel()->text().contains("Age model stored as run #"));
    CHECK(demo.modelRuns("age-model") == 1);
    const auto view_svg = demo.dir / "view.svg";
    REQUIRE(window.exportTo(QString::fromStdString(view_svg.string())));
    // Same data, options and seed through the same layout and writer: the same file.
    CHECK(fileText(view_svg) == fileText(cli_svg));
    CHECK(fileText(cli_svg).find("<title>Age-depth model, hole KAL1</title>") != std::string::npos);
}

TEST_CASE("An age model is built once per data and settings, and stored with its provenance",
          "[view][figures]") {
    ImportedDemo demo;
    view::AgeModelCache cache;
    const auto first = view::makeFigure(demo.project, demoRequest(FigureKind::AgeDepth), cache);
    CHECK(first.models_note.find("stored as run #") != std::string::npos);
    CHECK(demo.modelRuns("age-model") == 1);
    {
        db::ProjectStore store = db::ProjectStore::open(demo.project);
        const auto runs = store.modelRuns();
        const auto &run = runs.back();
        CHECK(run.kind == "age-model");
        CHECK(run.seed == 1);
        CHECK(run.settings.find("age.hole=KAL1") != std::string::npos);
        CHECK(run.inputs_sha256 == db::ProjectStore::datasetHash(store.loadDataset()));
    }
    // The rates of the same hole with the same settings reuse the model: no second run.
    std::vector<std::string> phases;
    const auto rates = view::makeFigure(demo.project, demoRequest(FigureKind::RatesDepth), cache,
                                        [&](const std::string &p) {
                                            phases.push_back(p);
                                            return true;
                                        });
    CHECK(rates.models_note == "age model reused from this session");
    CHECK(cache.size() == 1);
    CHECK(demo.modelRuns("age-model") == 1);
    for (const auto &p : phases) CHECK(p.find("age model of") == std::string::npos);
    // Another seed is another model.
    view::FigureRequest other = demoRequest(FigureKind::AgeDepth);
    other.model.seed = 7;
    view::makeFigure(demo.project, other, cache);
    CHECK(cache.size() == 2);
    CHECK(demo.modelRuns("age-model") == 2);
}

TEST_CASE("A stopped figure stores nothing", "[view][figures]") {
    ImportedDemo demo;
    view::AgeModelCache cache;
    for (const std::string stop_at : {"age model of", "storing"}) {
        INFO("stop at " << stop_at);
        CHECK_THROWS_AS(view::makeFigure(demo.project, demoRequest(FigureKind::AgeDepth), cache,
                                         [&](const std::string &p) {
                                             return p.find(stop_at) == std::string::npos;
                                         }),
                        cli::AnalysisStopped);
        CHECK(demo.modelRuns("age-model") == 0);
        CHECK(cache.size() == 0);
    }

    // Inside the age model: the draws report their blocks; a stop at the third ends the model.
    std::vector<std::size_t> done;
    std::size_t total = 0;
    CHECK_THROWS_AS(view::makeFigure(demo.project, demoRequest(FigureKind::AgeDepth), cache, {},
                                     [&](std::size_t d, std::size_t t) {
                                         done.push_back(d);
                                         total = t;
                                         return d < 3;
                                     }),
                    cli::AnalysisStopped);
    CHECK(done == std::vector<std::size_t>{0, 1, 2, 3});
    CHECK(total > 3);
    CHECK(demo.modelRuns("age-model") == 0);
    CHECK(cache.size() == 0);

    // In the window: Stop right after Draw ends the job with nothing stored, whichever phase
    // the worker had reached (a long model is stopped before it is stored).
    view::FigureWindow window;
    window.setProject(QString::fromStdString(demo.project.string()), {"KAL1"});
    window.drawsBox()->setValue(200000);
    QSignalSpy ended(&window, &view::FigureWindow::jobEnded);
    REQUIRE(window.draw());
    CHECK(window.busy());
    CHECK_FALSE(window.drawButton()->isEnabled());
    window.stop();
    REQUIRE(ended.wait(300000));
    CHECK(window.statusLabel()->text() == "Stopped; nothing was stored.");
    CHECK(demo.modelRuns("age-model") == 0);
    CHECK_FALSE(window.busy());
    CHECK(window.drawButton()->isEnabled());

    // Stopped while the bar shows the model's draws: it stops part way, long before its end.
    QProgressBar *bar = window.progressBar();
    int last_done = 0, last_total = 0;
    QObject::connect(bar, &QProgressBar::valueChanged, [&](int v) {
        if (v > 0) { // not the resets between phases and at the end
            last_done = v;
            last_total = bar->maximum();
        }
    });
    REQUIRE(window.draw());
    for (int i = 0; i < 6000 && last_done < 2; ++i) QTest::qWait(10);
    REQUIRE(last_done >= 2); // the bar moved: a length is known
    CHECK(bar->maximum() > 400); // 200,000 draws: about 391 chains of 512 and the pilot's
    window.stop();
    REQUIRE(ended.wait(300000));
    CHECK(window.statusLabel()->text() == "Stopped; nothing was stored.");
    CHECK(last_done < last_total / 2);
    CHECK(demo.modelRuns("age-model") == 0);
}

TEST_CASE("A figure that cannot be drawn says why in the window", "[view][figures][bad-input]") {
    ImportedDemo demo;
    view::FigureWindow window;
    window.setProject(QString::fromStdString(demo.project.string()), {"OSS1", "PEL1"});
    window.kindCombo()->setCurrentText("Line of correlation");
    window.holeCombo()->setCurrentText("OSS1");
    window.withHoleCombo()->setCurrentText("OSS1");
    QSignalSpy ended(&window, &view::FigureWindow::jobEnded);
    REQUIRE(window.draw());
    REQUIRE(ended.wait(60000));
    CHECK(window.statusLabel()->text().contains("needs two different holes"));
    // Drawing again while nothing runs is fine; without a project it is refused at once.
    view::FigureWindow empty;
    CHECK_FALSE(empty.draw());
    CHECK(empty.statusLabel()->text().contains("Open a project"));
}

TEST_CASE("The main window opens the figures of its project and lists recent projects",
          "[view][figures]") {
    ImportedDemo demo;
    QStringList messages;
    view::MainWindow window;
    window.setMessageSink([&](const QString &t, const QString &m) { messages << t + ": " + m; });
    const QString path = QString::fromStdString(std::filesystem::absolute(demo.project).string());
    REQUIRE(window.openProject(path));
    CHECK(view::MainWindow::recentProjects().value(0) == path);
    CHECK(view::MainWindow::recentProjects().size() <= view::MainWindow::kRecentProjects);

    view::FigureWindow *figures = window.showFigures();
    REQUIRE(figures != nullptr);
    CHECK(figures->isVisible());
    CHECK(figures->holeCombo()->findText("PEL1") >= 0);
    figures->kindCombo()->setCurrentText("Age against chain distance");
    CHECK_FALSE(figures->holeCombo()->isEnabled()); // the chain figure takes every hole
    QSignalSpy ended(figures, &view::FigureWindow::jobEnded);
    REQUIRE(figures->draw());
    REQUIRE(ended.wait(60000));
    INFO(figures->statusLabel()->text().toStdString());
    CHECK_FALSE(figures->canvas()->scene().list.withRole(draw::ItemRole::ChainPoint).empty());
    CHECK(messages.isEmpty());
}

TEST_CASE("figures window for a look", "[.look]") {
    ImportedDemo demo;
    view::FigureWindow window;
    window.setProject(QString::fromStdString(demo.project.string()), {"KAL1", "TOR1", "OSS1", "PEL1"});
    window.kindCombo()->setCurrentText("Accretion rate against age");
    window.holeCombo()->setCurrentText("TOR1");
    window.drawsBox()->setValue(2000);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    QSignalSpy ended(&window, &view::FigureWindow::jobEnded);
    REQUIRE(window.draw());
    REQUIRE(ended.wait(120000));
    QTest::qWait(100);
    const QString dir = qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp"));
    REQUIRE(window.grab().save(dir + QStringLiteral("/figures.png")));
}
