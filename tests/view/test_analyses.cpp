// The viewer's analyses window: datum picks, zones and the composite sequence run from the
// demo project by the same functions as `atollog datums`, `zones` and `sequence` (an exported
// table is the command's --csv output, byte for byte), stored once with their provenance and
// then "unchanged", a stopped run stores nothing, and a bad request is a message, not a crash.
#include "desk_fixture.hpp"
#include "imported_demo.hpp"

#include "view/analysis_request.hpp"
#include "view/analysis_result_model.hpp"
#include "view/analysis_window.hpp"
#include "view/main_window.hpp"

#include "atollog/db/project_store.hpp"

#include <QAbstractItemModelTester>
#include <QCheckBox>
#include <QComboBox>
#include <QFile>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QSignalSpy>
#include <QSpinBox>
#include <QTableView>
#include <QTest>

#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>

using namespace atollog;
using namespace atollog::view::test;
using view::AnalysisKind;

namespace {

/// Runs the window's current request and waits for it to end.
void runAndWait(view::AnalysisWindow &window, int timeout_ms = 300000) {
    QSignalSpy ended(&window, &view::AnalysisWindow::jobEnded);
    REQUIRE(window.run());
    REQUIRE(ended.wait(timeout_ms));
    INFO(window.statusLabel()->text().toStdString());
    REQUIRE(window.statusLabel()->text().startsWith("Done"));
}

/// A quick search with the demo's seed (run-demo.sh), short enough for a test.
void quickSequence(view::AnalysisWindow &window) {
    window.kindCombo()->setCurrentText("Composite sequence");
    window.seedBox()->setValue(730117);
    window.restartsBox()->setValue(2);
    window.movesBox()->setValue(20000);
}

const std::vector<std::string> kQuickSequenceArgs{"--seed", "730117", "--restarts", "2",
                                                  "--moves", "20000"};

std::vector<std::string> with(std::vector<std::string> a, const std::vector<std::string> &b) {
    a.insert(a.end(), b.begin(), b.end());
    return a;
}

} // namespace

TEST_CASE("Each analysis exported from the window is the command's --csv, byte for byte",
          "[view][analyses]") {
    ImportedDemo demo;
    ModelTesterLog log;
    view::AnalysisWindow window;
    QAbstractItemModelTester tester(window.resultModel(),
                                    QAbstractItemModelTester::FailureReportingMode::Warning);
    window.setProject(demo.path(), {"KAL1", "TOR1", "OSS1", "PEL1"});
    const auto csv = demo.dir / "table.csv";
    auto exported = [&] {
        REQUIRE(window.exportCsv(QString::fromStdString(csv.string())));
        return fileText(csv);
    };

    SECTION("datum picks, all holes, ranges extended (run-demo.sh's options)") {
        window.kindCombo()->setCurrentText("Datum picks");
        window.extendBox()->setChecked(true);
        runAndWait(window);
        const auto cmd = atollog::test::runAtollog(
            {"datums", demo.project.string(), "--extend", "0.95", "--csv", "--no-store"});
        REQUIRE(cmd.exit_code == 0);
        CHECK(exported() == cmd.out);
        CHECK(window.resultModel()->rowCount() > 20);
        CHECK(window.resultModel()->rowCount() ==
              static_cast<int>(std::count(cmd.out.begin(), cmd.out.end(), '\n')) - 1);
    }
    SECTION("datum picks of one hole with the events not found") {
        window.kindCombo()->setCurrentText("Datum picks");
        window.holeCombo()->setCurrentText("TOR1");
        window.allEventsBox()->setChecked(true);
        runAndWait(window);
        const auto cmd = atollog::test::runAtollog(
            {"datums", demo.project.string(), "--hole", "TOR1", "--all", "--csv", "--no-store"});
        REQUIRE(cmd.exit_code == 0);
        CHECK(exported() == cmd.out);
        CHECK(cmd.out.find("KAL1") == std::string::npos);
    }
    SECTION("every zone table") {
        window.kindCombo()->setCurrentText("Zones");
        for (int i = 0; i < window.tableCombo()->count(); ++i) {
            window.tableCombo()->setCurrentIndex(i);
            const std::string by = window.tableCombo()->currentData().toString().toStdString();
            INFO("--by " << by);
            runAndWait(window);
            const auto cmd =
                atollog::test::runAtollog({"zones", demo.project.string(), "--by", by, "--csv"});
            REQUIRE(cmd.exit_code == 0);
            CHECK(exported() == cmd.out);
        }
        CHECK(window.tableCombo()->count() == 5);
        window.holeCombo()->setCurrentText("PEL1");
        window.tableCombo()->setCurrentIndex(0);
        runAndWait(window);
        const auto cmd = atollog::test::runAtollog({"zones", demo.project.string(), "--hole", "PEL1", "--csv"});
        CHECK(exported() == cmd.out);
        CHECK(window.provenanceLabel()->text().startsWith("Not stored"));
    }
    SECTION("the composite sequence, in order and as range extensions") {
        quickSequence(window);
        runAndWait(window);
        const auto cmd = atollog::test::runAtollog(
            with({"sequence", demo.project.string(), "--csv", "--no-store"}, kQuickSequenceArgs));
        REQUIRE(cmd.exit_code == 0);
        CHECK(exported() == cmd.out);
        // The summary line is the command's (threads differ: the result does not).
        const std::string summary = cmd.err.substr(0, cmd.err.find('\n'));
        CHECK(window.provenanceLabel()->text().contains(QString::fromStdString(summary)));
        window.tableCombo()->setCurrentText("Range extensions per hole");
        runAndWait(window);
        const auto ext = atollog::test::runAtollog(with(
            {"sequence", demo.project.string(), "--by", "extension", "--csv", "--no-store"},
            kQuickSequenceArgs));
        CHECK(exported() == ext.out);
    }
    CHECK(log.messages().isEmpty());
}

TEST_CASE("Picks and the sequence are stored once with the commands' provenance",
          "[view][analyses]") {
    ImportedDemo demo;
    view::AnalysisRequest picks;
    picks.kind = AnalysisKind::DatumPicks;
    picks.biostrat.extend = 0.95;
    const view::AnalysisResult first = view::runAnalysis(demo.project, picks);
    CHECK(first.provenance.rfind("stored as run #", 0) == 0);
    const view::AnalysisResult second = view::runAnalysis(demo.project, picks);
    const std::string id = first.provenance.substr(std::string("stored as run #").size());
    CHECK(second.provenance == "unchanged since run #" + id);
    CHECK(demo.modelRuns("datums") == 1);
    // The command finds the same record: same kind, settings and inputs.
    auto cmd = atollog::test::runAtollog({"datums", demo.project.string(), "--extend", "0.95"});
    CHECK(cmd.out.find("tie points unchanged since run #" + id + "\n") != std::string::npos);
    // Other settings are another run.
    picks.biostrat.extend.reset();
    CHECK(view::runAnalysis(demo.project, picks).provenance.rfind("stored as run #", 0) == 0);
    CHECK(demo.modelRuns("datums") == 2);

    view::AnalysisRequest seq;
    seq.kind = AnalysisKind::CompositeSequence;
    seq.sequence.seed = 730117;
    seq.sequence.restarts = 2;
    seq.sequence.moves = 20000;
    seq.sequence.threads = 2;
    const std::string stored = view::runAnalysis(demo.project, seq).provenance;
    REQUIRE(stored.rfind("stored as run #", 0) == 0);
    const std::string seq_id = stored.substr(std::string("stored as run #").size());
    CHECK(view::runAnalysis(demo.project, seq).provenance == "unchanged since run #" + seq_id);
    cmd = atollog::test::runAtollog(with({"sequence", demo.project.string()}, kQuickSequenceArgs));
    CHECK(cmd.out.find("sequence unchanged since run #" + seq_id + "\n") != std::string::npos);
    CHECK(demo.modelRuns("sequence") == 1);

    // Zones are never stored, as the command stores none.
    view::AnalysisRequest zones;
    zones.kind = AnalysisKind::Zones;
    const std::size_t before = db::ProjectStore::open(demo.project).modelRuns().size();
    view::runAnalysis(demo.project, zones);
    CHECK(db::ProjectStore::open(demo.project).modelRuns().size() == before);
}

TEST_CASE("A stopped analysis stores nothing", "[view][analyses]") {
    ImportedDemo demo;
    view::AnalysisRequest seq;
    seq.kind = AnalysisKind::CompositeSequence;
    seq.sequence.moves = 20000;
    view::AnalysisRequest picks;
    picks.kind = AnalysisKind::DatumPicks;
    // A stop asked for at any phase, the storing one included, stores nothing.
    for (const std::string stop_at : {"picking", "annealing", "storing"}) {
        INFO("stop at " << stop_at);
        auto at = [&](const std::string &p) { return p.find(stop_at) == std::string::npos; };
        CHECK_THROWS_AS(view::runAnalysis(demo.project, seq, at), cli::AnalysisStopped);
        if (stop_at != "annealing")
            CHECK_THROWS_AS(view::runAnalysis(demo.project, picks, at), cli::AnalysisStopped);
    }
    // Inside the annealing: the blocks of moves report; a stop at the third ends the search.
    std::vector<std::size_t> done;
    std::size_t total = 0;
    CHECK_THROWS_AS(view::runAnalysis(demo.project, seq, {},
                                      [&](std::size_t d, std::size_t t) {
                                          done.push_back(d);
                                          total = t;
                                          return d < 3;
                                      }),
                    cli::AnalysisStopped);
    CHECK(done == std::vector<std::size_t>{0, 1, 2, 3});
    CHECK(total == 2 * 4 * 16); // 4 restarts of 16 blocks, first pass and replay
    CHECK(demo.modelRuns("sequence") == 0);
    CHECK(demo.modelRuns("datums") == 0);

    // In the window, while the bar shows the annealing: it stops part way.
    view::AnalysisWindow window;
    window.setProject(demo.path(), {"KAL1"});
    window.kindCombo()->setCurrentText("Composite sequence");
    window.movesBox()->setValue(5000000);
    QProgressBar *bar = window.progressBar();
    int last_done = 0, last_total = 0;
    QObject::connect(bar, &QProgressBar::valueChanged, [&](int v) {
        if (v > 0) {
            last_done = v;
            last_total = bar->maximum();
        }
    });
    QSignalSpy ended(&window, &view::AnalysisWindow::jobEnded);
    REQUIRE(window.run());
    CHECK(window.busy());
    CHECK_FALSE(window.runButton()->isEnabled());
    for (int i = 0; i < 12000 && last_done < 2; ++i) QTest::qWait(10);
    REQUIRE(last_done >= 2); // the bar moved: a length is known
    CHECK(last_total == 2 * 4 * 16);
    window.stop();
    REQUIRE(ended.wait(300000));
    CHECK(window.statusLabel()->text() == "Stopped; nothing was stored.");
    CHECK(last_done < last_total / 2);
    CHECK(demo.modelRuns("sequence") == 0);
    CHECK_FALSE(window.busy());
    CHECK(window.runButton()->isEnabled());
    CHECK_FALSE(window.exportButton()->isEnabled());
}

TEST_CASE("A bad analysis request gives a message in the window",
          "[view][analyses][bad-input]") {
    view::AnalysisWindow empty;
    CHECK_FALSE(empty.run());
    CHECK(empty.statusLabel()->text().contains("Open a project"));
    CHECK_FALSE(empty.exportCsv(QStringLiteral("/nonexistent/x.csv")));
    CHECK(empty.statusLabel()->text().contains("Run an analysis first"));

    ImportedDemo demo;
    view::AnalysisRequest picks;
    picks.kind = AnalysisKind::Zones;
    picks.hole = "NOPE";
    CHECK_THROWS_WITH(view::runAnalysis(demo.project, picks),
                      "no hole 'NOPE' in the project; holes are: KAL1, TOR1, OSS1, PEL1");

    // A hole the project no longer has (listed when the window was given the project).
    view::AnalysisWindow window;
    window.setProject(demo.path(), {"NOPE"});
    window.holeCombo()->setCurrentText("NOPE");
    QSignalSpy ended(&window, &view::AnalysisWindow::jobEnded);
    REQUIRE(window.run());
    REQUIRE(ended.wait(60000));
    CHECK(window.statusLabel()->text() ==
          "Cannot run this analysis: no hole 'NOPE' in the project; holes are: KAL1, TOR1, "
          "OSS1, PEL1");
    CHECK(demo.modelRuns("datums") == 0);

    // A project file that is gone.
    window.setProject(QString::fromStdString((demo.dir / "gone.atollog").string()), {});
    REQUIRE(window.run());
    REQUIRE(ended.wait(60000));
    CHECK(window.statusLabel()->text().startsWith("Cannot run this analysis:"));
    CHECK(window.statusLabel()->text().contains("gone.atollog"));
    CHECK(window.runButton()->isEnabled());

    // An export to a folder that does not exist says so and writes nothing.
    window.setProject(demo.path(), {"KAL1"});
    runAndWait(window);
    CHECK_FALSE(window.exportCsv(QString::fromStdString((demo.dir / "no" / "t.csv").string())));
    CHECK(window.statusLabel()->text().startsWith("Cannot write"));
}

TEST_CASE("The main window opens the analyses of its project", "[view][analyses]") {
    ImportedDemo demo;
    QStringList messages;
    view::MainWindow window;
    window.setMessageSink([&](const QString &t, const QString &m) { messages << t + ": " + m; });
    REQUIRE(window.openProject(
        QString::fromStdString(std::filesystem::absolute(demo.project).string())));
    view::AnalysisWindow *analyses = window.showAnalyses();
    REQUIRE(analyses != nullptr);
    CHECK(analyses->isVisible());
    CHECK(analyses->holeCombo()->itemText(0) == "All holes");
    CHECK(analyses->holeCombo()->findText("PEL1") >= 0);
    CHECK(window.showAnalyses() == analyses); // one window, raised again
    analyses->kindCombo()->setCurrentText("Composite sequence");
    CHECK_FALSE(analyses->holeCombo()->isEnabled()); // the sequence takes every hole
    CHECK(analyses->seedBox()->value() == 1);         // the command's defaults
    CHECK(analyses->restartsBox()->value() == 4);
    CHECK(analyses->movesBox()->value() == 200000);
    analyses->kindCombo()->setCurrentText("Datum picks");
    CHECK(analyses->holeCombo()->isEnabled());
    analyses->holeCombo()->setCurrentText("OSS1");
    runAndWait(*analyses);
    CHECK(analyses->provenanceLabel()->text().startsWith("Stored as run #"));
    CHECK(messages.isEmpty());
}

TEST_CASE("analyses window for a look", "[.look]") {
    ImportedDemo demo;
    view::AnalysisWindow window;
    window.setProject(demo.path(), {"KAL1", "TOR1", "OSS1", "PEL1"});
    quickSequence(window);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    runAndWait(window);
    QTest::qWait(100);
    const QString dir = qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp"));
    REQUIRE(window.grab().save(dir + QStringLiteral("/analyses.png")));
    window.kindCombo()->setCurrentText("Datum picks");
    window.extendBox()->setChecked(true);
    runAndWait(window);
    QTest::qWait(100);
    REQUIRE(window.grab().save(dir + QStringLiteral("/analyses-picks.png")));
}
