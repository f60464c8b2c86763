// The logging desk as a logger uses it: tab through the fields (computed ones skipped), type a
// value and Tab on, see a refusal on the message line, undo and redo with the standard keys;
// and in the main window: the dock, the Edit menu, the panel following an edit. The hidden
// "[.look]" case writes $TMPDIR/desk.png (default /tmp) for a look.
#include "desk_fixture.hpp"

#include "view/desk_project.hpp"
#include "view/desk_table_view.hpp"
#include "view/intervals_table_model.hpp"
#include "view/logging_desk.hpp"
#include "view/main_window.hpp"
#include "view/runs_table_model.hpp"
#include "view/word_choice_delegate.hpp"

#include <QAction>
#include <QApplication>
#include <QComboBox>
#include <QDir>
#include <QDockWidget>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QMenuBar>
#include <QTest>
#include <QUndoStack>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

using IvCol = IntervalsTableModel::Column;
using RunCol = RunsTableModel::Column;

struct ShownDesk {
    DemoCopy copy;
    LoggingDesk desk;
    ShownDesk() {
        desk.resize(1300, 500);
        desk.show();
        REQUIRE(QTest::qWaitForWindowExposed(&desk));
        REQUIRE(desk.openProject(copy.qpath()));
    }
};

} // namespace

TEST_CASE("the desk opens a project with its holes, first hole chosen", "[view][desk]") {
    ShownDesk s;
    CHECK(s.desk.holeCombo()->count() == 4);
    CHECK(s.desk.holeCombo()->currentData().toString() == QLatin1String("KAL1"));
    CHECK(s.desk.runsModel()->rowCount() == 17);
    REQUIRE(s.desk.chooseHole(QStringLiteral("TOR1")));
    CHECK(s.desk.runsModel()->runAt(0).hole == "TOR1");
    CHECK(s.desk.intervalsModel()->intervalAt(0).hole == "TOR1");
    CHECK_FALSE(s.desk.chooseHole(QStringLiteral("NOPE")));
    s.desk.setDepthUnit(DepthUnit::Foot);
    CHECK(s.desk.runsModel()->depthUnit() == DepthUnit::Foot);
    CHECK(s.desk.intervalsModel()->depthUnit() == DepthUnit::Foot);

    LoggingDesk other;
    CHECK_FALSE(other.openProject(QStringLiteral("/nonexistent/x.atollog")));
    CHECK(other.refusalLine()->text().contains(QLatin1String("/nonexistent/x.atollog")));
    CHECK(other.holeCombo()->count() == 0);
}

TEST_CASE("tab moves through the editable fields and skips the computed ones", "[view][desk]") {
    ShownDesk s;
    DeskTableView *view = s.desk.intervalsView();
    view->setFocus();
    view->setCurrentIndex(s.desk.intervalsModel()->index(0, IvCol::Binding));
    QTest::keyClick(view, Qt::Key_Tab);
    CHECK(view->currentIndex().column() == IvCol::Texture); // "Texture from attributes" skipped
    QTest::keyClick(view, Qt::Key_Backtab);
    CHECK(view->currentIndex().column() == IvCol::Binding);
    // From the last field of a row to the first of the next.
    view->setCurrentIndex(s.desk.intervalsModel()->index(0, IvCol::Notes));
    QTest::keyClick(view, Qt::Key_Tab);
    CHECK(view->currentIndex().row() == 1);
    CHECK(view->currentIndex().column() == IvCol::Top);

    DeskTableView *runs = s.desk.runsView();
    runs->setFocus();
    runs->setCurrentIndex(s.desk.runsModel()->index(0, RunCol::Recovered));
    QTest::keyClick(runs, Qt::Key_Tab); // cored and recovery are computed
    CHECK(runs->currentIndex().row() == 1);
    CHECK(runs->currentIndex().column() == RunCol::Run);
}

TEST_CASE("typing a value and pressing Tab stores it and opens the next field",
          "[view][desk]") {
    ShownDesk s;
    DeskTableView *view = s.desk.intervalsView();
    QApplication::setActiveWindow(&s.desk);
    view->setFocus();
    view->setCurrentIndex(s.desk.intervalsModel()->index(0, IvCol::Porosity));
    QTest::keyClick(view, Qt::Key_F2); // F2 edits on every platform (EditKeyPressed)
    auto *editor = qobject_cast<QLineEdit *>(QApplication::focusWidget());
    REQUIRE(editor);
    editor->selectAll();
    QTest::keyClicks(editor, QStringLiteral("12.5"));
    QTest::keyClick(editor, Qt::Key_Tab);
    CHECK(view->currentIndex().column() == IvCol::Carbonate);
    CHECK(qobject_cast<QLineEdit *>(QApplication::focusWidget()) != nullptr); // next one open
    const CoreDataset stored = s.copy.readBack();
    CHECK(stored.intervals.at(0).porosity_pct == 12.5);
    CHECK(s.desk.desk()->undoStack()->count() == 1);
}

TEST_CASE("vocabulary fields are picked from a list of the allowed words", "[view][desk]") {
    ShownDesk s;
    DeskTableView *view = s.desk.intervalsView();
    QApplication::setActiveWindow(&s.desk);
    view->setFocus();
    view->setCurrentIndex(s.desk.intervalsModel()->index(0, IvCol::Rock));
    QTest::keyClick(view, Qt::Key_F2);
    auto *combo = qobject_cast<QComboBox *>(QApplication::focusWidget());
    REQUIRE(combo);
    CHECK(combo->currentText() == QLatin1String("limestone"));
    REQUIRE(combo->findText(QStringLiteral("dolostone")) >= 0);
    combo->setCurrentIndex(combo->findText(QStringLiteral("dolostone")));
    QTest::keyClick(combo, Qt::Key_Tab);
    CHECK(s.copy.readBack().intervals.at(0).rock == Rock::Dolostone);
    CHECK(view->currentIndex().column() == IvCol::MudSupported);
    auto *next = qobject_cast<QComboBox *>(QApplication::focusWidget());
    REQUIRE(next); // yes / no / empty
    CHECK(next->count() == 3);
    QTest::keyClick(next, Qt::Key_Tab); // left as it was: nothing written
    CHECK(s.desk.desk()->undoStack()->count() == 1);
    // Free fields keep the line edit.
    CHECK_FALSE(s.desk.intervalsModel()->index(0, IvCol::Notes).data(kWordChoicesRole).isValid());
}

TEST_CASE("a refusal shows on the message line; undo and redo use the standard keys",
          "[view][desk]") {
    ShownDesk s;
    CHECK(s.desk.undoAction()->shortcuts() == QKeySequence::keyBindings(QKeySequence::Undo));
    CHECK(s.desk.redoAction()->shortcuts() == QKeySequence::keyBindings(QKeySequence::Redo));
    CHECK_FALSE(s.desk.undoAction()->isEnabled());

    RunsTableModel *runs = s.desk.runsModel();
    CHECK_FALSE(runs->setData(runs->index(0, RunCol::Recovered), QStringLiteral("-2")));
    CHECK(s.desk.refusalLine()->isVisibleTo(&s.desk));
    CHECK(s.desk.refusalLine()->text().startsWith(QLatin1String("Last refusal: runs: run 'KAL1-R01'")));
    CHECK(s.desk.refusalLine()->text().contains(QLatin1String("recovered_m")));

    REQUIRE(runs->setData(runs->index(0, RunCol::Recovered), QStringLiteral("1.5")));
    CHECK(s.desk.undoAction()->isEnabled());
    CHECK(s.desk.refusalLine()->text().startsWith(QLatin1String("Last refusal:"))); // kept
    s.desk.undoAction()->trigger();
    CHECK(s.copy.readBack().runs.at(0).recovered_m == 1.69);
    CHECK(s.desk.redoAction()->isEnabled());
    s.desk.redoAction()->trigger();
    CHECK(s.copy.readBack().runs.at(0).recovered_m == 1.5);

    // Over 100 % recovery is a warning: stored, and shown on the second line.
    REQUIRE(runs->setData(runs->index(0, RunCol::Recovered), QStringLiteral("2.3")));
    CHECK(s.desk.warningLine()->isVisibleTo(&s.desk));
    CHECK(s.desk.warningLine()->text().contains(QLatin1String("recovered_m")));
    CHECK(runs->index(0, RunCol::Recovery).data().toString() == QLatin1String("109.5"));
}

TEST_CASE("the add-interval action opens the new interval's base for typing", "[view][desk]") {
    ShownDesk s;
    QApplication::setActiveWindow(&s.desk);
    IntervalsTableModel *model = s.desk.intervalsModel();
    const int n = model->rowCount();
    s.desk.addIntervalAction()->trigger();
    REQUIRE(model->rowCount() == n + 1);
    CHECK(s.desk.intervalsView()->currentIndex() == model->index(n, IvCol::Base));
    // An editor is open on that cell (indexWidget is the persistent editor API; the line edit
    // of a plain edit has the focus instead).
    auto *editor = qobject_cast<QLineEdit *>(QApplication::focusWidget());
    REQUIRE(editor);
    CHECK(s.desk.intervalsView()->isAncestorOf(editor));
    CHECK(editor->text() == model->index(n, IvCol::Base).data().toString());
}

TEST_CASE("the main window holds the desk and reloads its panel after an edit",
          "[view][desk][window]") {
    DemoCopy copy;
    QStringList messages;
    MainWindow window;
    window.setMessageSink([&](const QString &t, const QString &m) { messages << t + ": " + m; });
    window.resize(1400, 1000);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    REQUIRE(window.openProject(copy.qpath()));
    REQUIRE(messages.isEmpty());

    auto *dock = window.findChild<QDockWidget *>(QStringLiteral("logging-desk-dock"));
    REQUIRE(dock);
    CHECK(dock->windowTitle() == QLatin1String("Logging desk"));
    LoggingDesk *desk = window.loggingDesk();
    CHECK(desk->holeCombo()->count() == 4);
    QMenu *edit = nullptr;
    for (QAction *a : window.menuBar()->actions()) {
        if (a->text() == QLatin1String("&Edit")) edit = a->menu();
    }
    REQUIRE(edit);
    CHECK(edit->actions().contains(desk->undoAction()));
    CHECK(edit->actions().contains(desk->redoAction()));

    auto kal1Run = [&] {
        for (const auto &column : window.shownInput().columns) {
            if (column.hole == "KAL1") return column.runs.at(0);
        }
        FAIL("KAL1 not shown");
        return draw::ColumnRun{};
    };
    REQUIRE(kal1Run().recovered_m == 1.69);
    RunsTableModel *runs = desk->runsModel();
    REQUIRE(runs->setData(runs->index(0, RunCol::Recovered), QStringLiteral("1.5")));
    // The panel reloads once the burst of edits is over (a timer), from the file.
    for (int i = 0; i < 50 && kal1Run().recovered_m != 1.5; ++i) {
        QTest::qWait(100);
    }
    CHECK(kal1Run().recovered_m == 1.5);
    CHECK(messages.isEmpty());
    CHECK(desk->desk()->undoStack()->count() == 1); // the reload left the desk's stack alone
}

TEST_CASE("screenshot of the window with the logging desk", "[.look]") {
    DemoCopy copy;
    MainWindow window;
    window.setMessageSink([](const QString &, const QString &) {});
    window.resize(1500, 1000);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    REQUIRE(window.openProject(copy.qpath()));
    LoggingDesk *desk = window.loggingDesk();
    RunsTableModel *runs = desk->runsModel();
    runs->setData(runs->index(1, RunCol::Recovered), QStringLiteral("-1")); // a refusal to show
    const QString path = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                             .filePath(QStringLiteral("desk.png"));
    QTest::qWait(200);
    REQUIRE(window.grab().save(path));
    WARN("screenshot: " << path.toStdString());
}
