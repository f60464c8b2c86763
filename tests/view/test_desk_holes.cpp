// The logging desk's holes table on a copy of the demo project: a hole renamed (its runs,
// samples and dates follow, the hole chooser keeps it chosen), its collar height typed in
// feet, its position cleared and refused out of range, a duplicate id and an unknown kind
// refused with nothing written, a new hole added and removed, a hole with runs kept, undo and
// redo through all of it, and the model tester watching.
#include "desk_fixture.hpp"

#include "view/desk_project.hpp"
#include "view/desk_table_view.hpp"
#include "view/holes_table_model.hpp"
#include "view/logging_desk.hpp"
#include "view/runs_table_model.hpp"
#include "view/word_choice_delegate.hpp"

#include <QAction>
#include <QComboBox>
#include <QDir>
#include <QTest>
#include <QTabWidget>
#include <QUndoStack>

#include <algorithm>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

using HoleCol = HolesTableModel::Column;

struct HolesDesk {
    DemoCopy copy;
    DeskProject project;
    HolesTableModel holes{project};
    HolesDesk() {
        REQUIRE(project.open(copy.qpath()));
        holes.setHole("KAL1");
    }
    QUndoStack &stack() { return *project.undoStack(); }
    bool type(int r, int c, const QString &text) { return holes.setData(holes.index(r, c), text); }
    QString cell(int r, int c) const { return holes.index(r, c).data().toString(); }
    /// The row of hole `id`, or -1.
    int rowOf(const std::string &id) const {
        for (int r = 0; r < holes.rowCount(); ++r) {
            if (holes.holeAt(r).hole == id) return r;
        }
        return -1;
    }
};

std::size_t runsOf(const CoreDataset &data, const std::string &hole) {
    return static_cast<std::size_t>(std::count_if(
        data.runs.begin(), data.runs.end(), [&](const CoreRun &r) { return r.hole == hole; }));
}

} // namespace

TEST_CASE("holes: every hole of the project, whatever hole is chosen", "[view][desk][holes]") {
    HolesDesk d;
    const CoreDataset original = d.copy.readBack();
    REQUIRE(d.holes.rowCount() == static_cast<int>(original.holes.size()));
    d.holes.setHole("PEL1");
    CHECK(d.holes.rowCount() == static_cast<int>(original.holes.size()));
    // Demo data: holes.csv gives KAL1 at -7.676 deg, collar 2.4 m, 40 km along the chain.
    const int kal = d.rowOf("KAL1");
    REQUIRE(kal >= 0);
    CHECK(d.cell(kal, HoleCol::Latitude) == QLatin1String("-7.676"));
    CHECK(d.cell(kal, HoleCol::CollarElevation) == QLatin1String("2.4"));
    CHECK(d.cell(kal, HoleCol::ChainDistance) == QLatin1String("40"));
    CHECK(d.cell(kal, HoleCol::Kind) == QLatin1String("core"));
    const QStringList kinds =
        d.holes.index(kal, HoleCol::Kind).data(kWordChoicesRole).toStringList();
    CHECK(kinds == QStringList({QStringLiteral("core"), QStringLiteral("cuttings")}));
}

TEST_CASE("holes: a renamed hole keeps its runs, and undo names it back",
          "[view][desk][holes]") {
    HolesDesk d;
    const CoreDataset original = d.copy.readBack();
    const std::size_t runs = runsOf(original, "KAL1");
    REQUIRE(runs > 0);
    REQUIRE(d.type(d.rowOf("KAL1"), HoleCol::HoleId, QStringLiteral("KAL1A")));
    const CoreDataset renamed = d.copy.readBack();
    CHECK(runsOf(renamed, "KAL1A") == runs);
    CHECK(runsOf(renamed, "KAL1") == 0);
    CHECK(d.stack().undoText() == QLatin1String("rename hole KAL1"));
    d.stack().undo();
    CHECK(d.copy.readBack() == original);
    d.stack().redo();
    CHECK(runsOf(d.copy.readBack(), "KAL1A") == runs);
}

TEST_CASE("holes: collar height in feet, a cleared position, and refusals",
          "[view][desk][holes]") {
    HolesDesk d;
    const CoreDataset original = d.copy.readBack();
    const int tor = d.rowOf("TOR1");
    REQUIRE(tor >= 0);

    SECTION("10 ft is stored as 3.048 m (1 ft = 0.3048 m exactly, international foot, 1959)") {
        d.holes.setDepthUnit(DepthUnit::Foot);
        CHECK(d.holes.headerData(HoleCol::CollarElevation, Qt::Horizontal).toString()
                  .contains(QLatin1String("(ft)")));
        REQUIRE(d.type(tor, HoleCol::CollarElevation, QStringLiteral("10")));
        const Hole h = d.copy.readBack().holes[static_cast<std::size_t>(tor)];
        REQUIRE(h.collar_elev_m.has_value());
        CHECK(*h.collar_elev_m == Approx(3.048).epsilon(1e-12));
        CHECK(d.cell(tor, HoleCol::CollarElevation) == QLatin1String("10"));
        d.stack().undo();
        CHECK(d.copy.readBack() == original);
    }
    SECTION("a cleared latitude is stored as not known") {
        REQUIRE(d.type(tor, HoleCol::Latitude, QString()));
        CHECK_FALSE(d.copy.readBack().holes[static_cast<std::size_t>(tor)].lat_deg.has_value());
        CHECK(d.cell(tor, HoleCol::Latitude).isEmpty());
    }
    SECTION("refused: a latitude beyond 90, a word for a number, a duplicate id, an unknown "
            "kind; nothing written") {
        Untouched before{d.copy, d.stack()};
        CHECK_FALSE(d.type(tor, HoleCol::Latitude, QStringLiteral("95")));
        QString message = d.holes.index(tor, HoleCol::Latitude).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("lat_deg")));
        CHECK(message.contains(QLatin1String("-90 to 90")));
        CHECK_FALSE(d.type(tor, HoleCol::ChainDistance, QStringLiteral("far")));
        CHECK(d.project.lastMessage().contains(QLatin1String("'far' is not a number")));
        CHECK_FALSE(d.type(tor, HoleCol::HoleId, QStringLiteral("KAL1")));
        CHECK(d.project.lastMessage().contains(QLatin1String("KAL1")));
        CHECK_FALSE(d.type(tor, HoleCol::Kind, QStringLiteral("auger")));
        CHECK(d.project.lastMessage().contains(QLatin1String("core, cuttings")));
        before.check();
    }
}

TEST_CASE("holes: added, removed, and a hole with runs kept", "[view][desk][holes]") {
    HolesDesk d;
    const CoreDataset original = d.copy.readBack();
    {
        Untouched before{d.copy, d.stack()};
        CHECK_FALSE(d.holes.removeRowAt(d.rowOf("KAL1")));
        const QString message = d.project.lastMessage();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("runs")));
        CHECK(message.contains(QLatin1String("remove them first")));
        before.check();
    }
    const QModelIndex added = d.holes.addRow();
    REQUIRE(added.isValid());
    const Hole h = d.holes.holeAt(added.row());
    CHECK(h.hole == "PEL2"); // after the last hole, PEL1
    CHECK(h.site == original.holes.back().site);
    CHECK_FALSE(h.lat_deg.has_value());
    CHECK(d.copy.readBack().holes.size() == original.holes.size() + 1);
    REQUIRE(d.holes.removeRowAt(added.row())); // no runs yet: removed
    CHECK(d.copy.readBack() == original);
    d.stack().undo(); // the removal
    CHECK(d.copy.readBack().holes.back().hole == "PEL2");
    d.stack().undo(); // the addition
    CHECK(d.copy.readBack() == original);
}

TEST_CASE("holes: the model tester while holes are edited", "[view][desk][holes]") {
    ModelTesterLog log;
    HolesDesk d;
    QAbstractItemModelTester tester(&d.holes, QAbstractItemModelTester::FailureReportingMode::Warning);
    REQUIRE(d.holes.addRow().isValid());
    CHECK(d.type(0, HoleCol::Site, QStringLiteral("Kalvessa north reef flat, east end")));
    CHECK_FALSE(d.type(0, HoleCol::Longitude, QStringLiteral("200")));
    d.holes.setDepthUnit(DepthUnit::Foot);
    for (int i = 0; i < 2; ++i) d.stack().undo();
    for (int i = 0; i < 2; ++i) d.stack().redo();
    d.holes.setHole("OSS1");
    INFO(log.messages().join(QLatin1Char('\n')).toStdString());
    CHECK(log.messages().isEmpty());
}

TEST_CASE("holes: the desk's hole chooser follows a rename, an added hole and undo",
          "[view][desk][holes]") {
    DemoCopy copy;
    LoggingDesk desk;
    REQUIRE(desk.openProject(copy.qpath()));
    REQUIRE(desk.chooseHole(QStringLiteral("TOR1")));
    const int runs = desk.runsModel()->rowCount();
    REQUIRE(runs > 0);
    QComboBox *chooser = desk.holeCombo();
    const int holes = chooser->count();

    desk.tabs()->setCurrentWidget(desk.holesView());
    CHECK(desk.addRowAction()->text() == QLatin1String("Add hole"));
    HolesTableModel &model = *desk.holesModel();
    int tor = -1;
    for (int r = 0; r < model.rowCount(); ++r) {
        if (model.holeAt(r).hole == "TOR1") tor = r;
    }
    REQUIRE(tor >= 0);
    REQUIRE(model.setData(model.index(tor, HoleCol::HoleId), QStringLiteral("TOR1B")));
    CHECK(chooser->currentData().toString() == QLatin1String("TOR1B")); // still chosen
    CHECK(desk.runsModel()->hole() == "TOR1B");
    CHECK(desk.runsModel()->rowCount() == runs);

    desk.addRowAction()->trigger();
    CHECK(chooser->count() == holes + 1);
    CHECK(chooser->currentData().toString() == QLatin1String("TOR1B"));
    desk.undoAction()->trigger(); // the added hole
    desk.undoAction()->trigger(); // the rename
    CHECK(chooser->count() == holes);
    CHECK(chooser->currentData().toString() == QLatin1String("TOR1"));
    CHECK(desk.runsModel()->rowCount() == runs);

    desk.setDepthUnit(DepthUnit::Foot); // the desk's unit reaches the collar heights too
    CHECK(model.depthUnit() == DepthUnit::Foot);
    CHECK(model.headerData(HoleCol::CollarElevation, Qt::Horizontal).toString()
              .contains(QLatin1String("(ft)")));
}

TEST_CASE("screenshot of the desk's holes tab", "[.look]") {
    DemoCopy copy;
    LoggingDesk desk;
    desk.resize(1400, 420);
    desk.show();
    REQUIRE(QTest::qWaitForWindowExposed(&desk));
    REQUIRE(desk.openProject(copy.qpath()));
    desk.setDepthUnit(DepthUnit::Foot);
    desk.tabs()->setCurrentWidget(desk.holesView());
    HolesTableModel &model = *desk.holesModel();
    model.setData(model.index(0, HoleCol::Latitude), QStringLiteral("-97.2")); // a refusal
    const QString path = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                             .filePath(QStringLiteral("desk-holes.png"));
    QTest::qWait(100);
    REQUIRE(desk.grab().save(path));
    WARN("screenshot: " << path.toStdString());
}
