// The logging desk's further tables on a copy of the demo project: dates of the chosen hole,
// the project's events and zones (update, add, remove, undo), rows added to and removed from
// runs, samples and intervals (undo puts a removed row back in its place), refusals (a
// negative sd, an event a zone uses, a sample with occurrences), the model tester on each
// while editing, and the desk's row actions following the current tab.
#include "desk_fixture.hpp"

#include "view/dates_table_model.hpp"
#include "view/desk_project.hpp"
#include "view/desk_table_view.hpp"
#include "view/events_table_model.hpp"
#include "view/intervals_table_model.hpp"
#include "view/logging_desk.hpp"
#include "view/next_id.hpp"
#include "view/runs_table_model.hpp"
#include "view/samples_table_model.hpp"
#include "view/value_with_sd.hpp"
#include "view/zones_table_model.hpp"

#include <SQLiteCpp/Database.h>

#include "atollog/engine/number_text.hpp"

#include <QAction>
#include <QLabel>
#include <QTabWidget>
#include <QUndoStack>

#include <algorithm>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

using DateCol = DatesTableModel::Column;
using EventCol = EventsTableModel::Column;
using ZoneCol = ZonesTableModel::Column;
using RunCol = RunsTableModel::Column;
using SampleCol = SamplesTableModel::Column;

struct Tables {
    DemoCopy copy;
    DeskProject project;
    RunsTableModel runs{project};
    IntervalsTableModel intervals{project};
    SamplesTableModel samples{project};
    DatesTableModel dates{project};
    EventsTableModel events{project};
    ZonesTableModel zones{project};
    explicit Tables(const std::string &hole = "KAL1") {
        REQUIRE(project.open(copy.qpath()));
        for (DeskTableModel *m : std::initializer_list<DeskTableModel *>{
                 &runs, &intervals, &samples, &dates, &events, &zones}) {
            m->setHole(hole);
            REQUIRE(m->rowCount() > 0);
        }
    }
    QUndoStack &stack() { return *project.undoStack(); }
};

QString cell(const QAbstractItemModel &m, int r, int c) { return m.index(r, c).data().toString(); }
bool type(QAbstractItemModel &m, int r, int c, const QString &text) {
    return m.setData(m.index(r, c), text);
}

std::vector<std::string> runIds(const CoreDataset &data, const std::string &hole) {
    std::vector<std::string> ids;
    for (const CoreRun &r : data.runs) {
        if (r.hole == hole) ids.push_back(r.run);
    }
    return ids;
}

/// The row of the dates model whose method is `method` (the first).
int dateRow(const DatesTableModel &m, DateMethod method) {
    for (int r = 0; r < m.rowCount(); ++r) {
        if (m.dateAt(r).method == method) return r;
    }
    FAIL("no date of that method");
    return -1;
}

} // namespace

TEST_CASE("ids of added rows count on from the last one", "[view][desk][tables]") {
    CHECK(nextId("KAL1-R17", {"KAL1-R17"}) == "KAL1-R18");
    CHECK(nextId("KAL1-019", {"KAL1-019", "KAL1-020"}) == "KAL1-021"); // taken: on to the next
    CHECK(nextId("R9", {}) == "R10");
    CHECK(nextId("VL4", {}) == "VL5");
    CHECK(nextId("B CYKA-VAS", {}) == "B CYKA-VAS-2");
    CHECK(nextId("B CYKA-VAS", {"B CYKA-VAS-2"}) == "B CYKA-VAS-3");
}

TEST_CASE("a value with its sd is read as typed", "[view][desk][tables]") {
    for (const char *typed : {"0.77094 ± 0.00251", "0.77094 +- 0.00251", "0.77094+/-0.00251",
                              " 0.77094   0.00251 "}) {
        const auto v = readValueWithSd(QString::fromUtf8(typed));
        REQUIRE(v);
        CHECK(v->first == 0.77094);
        CHECK(v->second == 0.00251);
    }
    CHECK_FALSE(readValueWithSd(QStringLiteral("0.77")));
    CHECK_FALSE(readValueWithSd(QStringLiteral("a ± b")));
    CHECK(valueWithSdText(0.77094, 0.00251) == QString::fromUtf8("0.77094 ± 0.00251"));
}

TEST_CASE("the further desk tables pass the model tester while logging", "[view][desk][tables]") {
    ModelTesterLog log;
    Tables t;
    std::vector<std::unique_ptr<QAbstractItemModelTester>> testers;
    for (QAbstractItemModel *m : std::initializer_list<QAbstractItemModel *>{
             &t.runs, &t.samples, &t.intervals, &t.dates, &t.events, &t.zones}) {
        testers.push_back(std::make_unique<QAbstractItemModelTester>(
            m, QAbstractItemModelTester::FailureReportingMode::Warning));
    }
    const int ar = dateRow(t.dates, DateMethod::ArAr);
    CHECK(type(t.dates, ar, DateCol::AgeSd, QStringLiteral("0.02")));
    CHECK_FALSE(type(t.dates, ar, DateCol::AgeSd, QStringLiteral("-0.02")));
    CHECK(t.dates.addRow().isValid());
    CHECK(t.events.addRow().isValid());
    CHECK(t.zones.addRow().isValid());
    CHECK(t.runs.addRow().isValid());
    CHECK(t.samples.addRow().isValid());
    CHECK(t.samples.removeRowAt(t.samples.rowCount() - 1));
    CHECK_FALSE(t.events.removeRowAt(0)); // zones use it
    CHECK(t.intervals.removeRowAt(0));
    t.dates.setDepthUnit(DepthUnit::Foot);
    for (int i = 0; i < 3; ++i) t.stack().undo();
    for (int i = 0; i < 3; ++i) t.stack().redo();
    for (DeskTableModel *m : std::initializer_list<DeskTableModel *>{
             &t.runs, &t.samples, &t.intervals, &t.dates, &t.events, &t.zones}) {
        m->setHole("TOR1");
    }
    INFO(log.messages().join(QLatin1Char('\n')).toStdString());
    CHECK(log.messages().isEmpty());
}

TEST_CASE("dates: shown at full precision, edited, refused, added and removed",
          "[view][desk][tables]") {
    Tables t;
    const CoreDataset original = t.copy.readBack();
    // Demo data: KAL1-001 is radiocarbon dated, F14C 0.77094 ± 0.00251 (dates.csv).
    REQUIRE(cell(t.dates, 0, DateCol::SampleId) == QLatin1String("KAL1-001"));
    CHECK(cell(t.dates, 0, DateCol::Method) == QLatin1String("c14"));
    CHECK(cell(t.dates, 0, DateCol::F14C) == QString::fromUtf8("0.77094 ± 0.00251"));
    CHECK(t.dates.headerData(DateCol::Age, Qt::Horizontal).toString() == QLatin1String("Age (Ma)"));
    CHECK(t.dates.headerData(DateCol::Depth, Qt::Horizontal).toString() == QLatin1String("Depth (m)"));
    const int uth = dateRow(t.dates, DateMethod::UTh);
    // KAL1-004's U-Th measurement: 0.07492 ± 4e-04; 1.14158 ± 0.00134 (dates.csv).
    CHECK(cell(t.dates, uth, DateCol::UThRatios) ==
          QString::fromUtf8("0.07492 ± 0.0004; 1.14158 ± 0.00134"));
    // Typing the shown text back writes nothing.
    CHECK(type(t.dates, uth, DateCol::UThRatios, cell(t.dates, uth, DateCol::UThRatios)));
    CHECK(t.stack().count() == 0);

    REQUIRE(type(t.dates, 0, DateCol::F14C, QStringLiteral("0.77 +- 0.003")));
    const CoreDataset edited = t.copy.readBack();
    REQUIRE(edited.dates.front().c14);
    CHECK(edited.dates.front().c14->f14c == 0.77);
    CHECK(edited.dates.front().c14->f14c_sd == 0.003);
    REQUIRE(type(t.dates, uth, DateCol::UThRatios, QStringLiteral("0.075 ± 0.0005; 1.14 ± 0.002")));
    CHECK(t.copy.readBack().dates[static_cast<std::size_t>(uth)].uth->u234_u238_act == 1.14);
    CHECK(t.copy.readBack().dates[static_cast<std::size_t>(uth)].uth->th232_ppb == 0.67); // kept
    t.stack().undo();
    t.stack().undo();
    CHECK(t.copy.readBack() == original);

    SECTION("a negative sd is refused with the field and the fix, the file untouched") {
        const int ar = dateRow(t.dates, DateMethod::ArAr);
        Untouched before{t.copy, t.stack()};
        CHECK_FALSE(type(t.dates, ar, DateCol::AgeSd, QStringLiteral("-0.01")));
        const QString message = t.dates.index(ar, DateCol::AgeSd).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("age_sd_ma")));
        CHECK(message.contains(QLatin1String("give one standard deviation greater than 0")));
        CHECK_FALSE(type(t.dates, 0, DateCol::F14C, QStringLiteral("0.77")));
        CHECK(t.project.lastMessage().contains(QLatin1String("is not a value with its sd")));
        CHECK_FALSE(type(t.dates, 0, DateCol::Th232, QStringLiteral("0.5")));
        CHECK(t.project.lastMessage().contains(QLatin1String("no U-Th measurement")));
        before.check();
    }
    SECTION("a new date lands on the next undated sample; removal and undo keep its place") {
        const QModelIndex added = t.dates.addRow();
        REQUIRE(added.isValid());
        const NumericalDate &made = t.dates.dateAt(added.row());
        REQUIRE(made.sample);
        const auto dated = std::count_if(original.dates.begin(), original.dates.end(),
                                         [&](const NumericalDate &d) { return d.sample == made.sample; });
        CHECK(dated == 0);
        CHECK(t.copy.readBack().dates.size() == original.dates.size() + 1);
        t.stack().undo();
        CHECK(t.copy.readBack() == original);
        REQUIRE(t.dates.removeRowAt(0));
        CHECK(t.copy.readBack().dates.size() == original.dates.size() - 1);
        t.stack().undo();
        CHECK(t.copy.readBack() == original); // back in the first place
    }
}

TEST_CASE("events and zones: update, add, remove, and an event a zone uses",
          "[view][desk][tables]") {
    Tables t;
    const CoreDataset original = t.copy.readBack();
    CHECK(t.events.rowCount() == static_cast<int>(original.events.size()));
    CHECK(t.zones.rowCount() == static_cast<int>(original.zones.size()));
    t.events.setHole("TOR1"); // project-wide: the hole does not matter
    CHECK(t.events.rowCount() == static_cast<int>(original.events.size()));

    SECTION("removing an event that zones use is refused, the zones counted") {
        // Demo data: zone VL1 is topped and VL2 based by "B CYKA-VAS", the first event.
        REQUIRE(cell(t.events, 0, EventCol::EventId) == QLatin1String("B CYKA-VAS"));
        Untouched before{t.copy, t.stack()};
        CHECK_FALSE(t.events.removeRowAt(0));
        const QString message = t.events.index(0, 0).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("B CYKA-VAS")));
        CHECK(message.contains(QLatin1String("still has 2 zones referring to it")));
        CHECK(message.contains(QLatin1String("remove those zones first")));
        before.check();
    }
    SECTION("an unused event is removed, and undo puts it back in its place") {
        int unused = -1;
        for (int r = 0; r < t.events.rowCount() && unused < 0; ++r) {
            const std::string id = t.events.eventAt(r).event;
            const bool used = std::any_of(original.zones.begin(), original.zones.end(), [&](const Zone &z) {
                return z.base_event == id || z.top_event == id;
            });
            if (!used && r > 0 && r + 1 < t.events.rowCount()) unused = r;
        }
        REQUIRE(unused > 0);
        REQUIRE(t.events.removeRowAt(unused));
        CHECK(t.copy.readBack().events.size() == original.events.size() - 1);
        t.stack().undo();
        CHECK(t.copy.readBack() == original);
        t.stack().redo();
        CHECK(t.copy.readBack().events.size() == original.events.size() - 1);
    }
    SECTION("an event's age and sd, and a refused negative sd") {
        REQUIRE(type(t.events, 0, EventCol::Age, QStringLiteral("4.6")));
        CHECK(t.copy.readBack().events.front().age_ma == 4.6);
        Untouched before{t.copy, t.stack()};
        CHECK_FALSE(type(t.events, 0, EventCol::AgeSd, QStringLiteral("-0.1")));
        CHECK(t.project.lastMessage().contains(QLatin1String("age_sd_ma")));
        CHECK_FALSE(type(t.events, 0, EventCol::Kind, QStringLiteral("middle")));
        CHECK(t.project.lastMessage().contains(QLatin1String("base, top")));
        before.check();
        t.stack().undo();
        CHECK(t.copy.readBack() == original);
    }
    SECTION("an added event and zone, then a zone using the new event") {
        const QModelIndex event = t.events.addRow();
        REQUIRE(event.isValid());
        const std::string new_id = t.events.eventAt(event.row()).event;
        CHECK(new_id == original.events.back().event + "-2");
        const QModelIndex zone = t.zones.addRow();
        REQUIRE(zone.isValid());
        CHECK(zone.column() == ZoneCol::TopEvent);
        const Zone &z = t.zones.zoneAt(zone.row());
        CHECK(z.scheme == original.zones.back().scheme);
        CHECK(z.base_event == original.zones.back().top_event);
        REQUIRE(t.zones.setData(zone, QString::fromStdString(new_id)));
        CHECK(t.copy.readBack().zones.back().top_event == new_id);
        // Now the new event is used: its removal is refused.
        CHECK_FALSE(t.events.removeRowAt(event.row()));
        CHECK(t.project.lastMessage().contains(QLatin1String("remove those zones first")));
        // A zone with the same event at base and top is the engine's error.
        CHECK_FALSE(t.zones.setData(t.zones.index(zone.row(), ZoneCol::BaseEvent),
                                    QString::fromStdString(new_id)));
        CHECK(t.project.lastMessage().contains(QLatin1String("two different events")));
        for (int i = 0; i < 3; ++i) t.stack().undo();
        CHECK(t.copy.readBack() == original);
    }
}

TEST_CASE("runs: added below the deepest, removed, and put back in place by undo",
          "[view][desk][tables]") {
    Tables t;
    const CoreDataset original = t.copy.readBack();
    const std::vector<std::string> ids = runIds(original, "KAL1");
    // Demo data: KAL1's deepest run is KAL1-R17, 36.8-38 m (runs.csv).
    REQUIRE(ids.back() == "KAL1-R17");
    const QModelIndex a = t.runs.addRow();
    REQUIRE(a.isValid());
    CHECK(a.column() == RunCol::Base);
    const CoreRun ra = t.runs.runAt(a.row());
    CHECK(ra.run == "KAL1-R18");
    CHECK(ra.top_m == 38.0);
    CHECK(ra.base_m == 39.2); // as long as R17 (1.2 m), rounded to the micrometre
    CHECK(ra.recovered_m == 0.0);
    const QModelIndex b = t.runs.addRow();
    REQUIRE(b.isValid());
    CHECK(t.runs.runAt(b.row()).run == "KAL1-R19");
    const CoreDataset both = t.copy.readBack();

    // Remove R18 (not the last row) and undo: it comes back before R19.
    REQUIRE(t.runs.removeRowAt(a.row()));
    std::vector<std::string> after = runIds(t.copy.readBack(), "KAL1");
    CHECK(std::find(after.begin(), after.end(), "KAL1-R18") == after.end());
    t.stack().undo();
    CHECK(t.copy.readBack() == both);
    after = runIds(t.copy.readBack(), "KAL1");
    REQUIRE(after.size() == ids.size() + 2);
    CHECK(after[after.size() - 2] == "KAL1-R18");
    CHECK(after.back() == "KAL1-R19");
    CHECK(t.runs.runAt(a.row()).run == "KAL1-R18");
    t.stack().redo();
    CHECK(t.runs.rowCount() == static_cast<int>(ids.size()) + 1);

    SECTION("a run that logged core lies in is not removed") {
        Untouched before{t.copy, t.stack()};
        CHECK_FALSE(t.runs.removeRowAt(0));
        const QString message = t.runs.index(0, 0).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK_FALSE(message.isEmpty());
        CHECK(t.project.lastWasRefusal());
        before.check();
    }
}

TEST_CASE("samples and intervals: added, removed, refused, undone in place",
          "[view][desk][tables]") {
    Tables t;
    const CoreDataset original = t.copy.readBack();
    SECTION("a new sample at the deepest one's base, its id counted on") {
        const QModelIndex added = t.samples.addRow();
        REQUIRE(added.isValid());
        CHECK(added.column() == SampleCol::Top);
        const Sample s = t.samples.sampleAt(added.row());
        // Demo data: KAL1's deepest sample is KAL1-019 (samples.csv).
        CHECK(s.sample == "KAL1-020");
        CHECK(s.kind == "core");
        REQUIRE(t.samples.setData(t.samples.index(added.row(), SampleCol::Top), QStringLiteral("37")));
        REQUIRE(t.samples.setData(t.samples.index(added.row(), SampleCol::Base), QStringLiteral("37")));
        CHECK(t.copy.readBack().samples.size() == original.samples.size() + 1);
        for (int i = 0; i < 3; ++i) t.stack().undo();
        CHECK(t.copy.readBack() == original);
    }
    SECTION("a sample with occurrences and dates is not removed; the message counts them") {
        Untouched before{t.copy, t.stack()};
        CHECK_FALSE(t.samples.removeRowAt(0));
        const QString message = t.samples.index(0, 0).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("KAL1-001")));
        CHECK(message.contains(QLatin1String("occurrence")));
        CHECK(message.contains(QLatin1String("remove them first")));
        before.check();
    }
    SECTION("the generic add of the intervals table is Add interval's interval") {
        const QModelIndex added = t.intervals.addRow();
        REQUIRE(added.isValid());
        CHECK(added.column() == IntervalsTableModel::Base);
        CHECK(t.copy.readBack().intervals.size() == original.intervals.size() + 1);
        t.stack().undo();
        CHECK(t.copy.readBack() == original);
        const int row = added.row();
        const QModelIndex again = t.intervals.addInterval();
        INFO(t.project.lastMessage().toStdString());
        CHECK(again.row() == row);
        CHECK(again.column() == IntervalsTableModel::Base);
    }
    SECTION("an interval removed from the middle comes back in its place") {
        REQUIRE(t.intervals.rowCount() > 3);
        const LithInterval second = t.intervals.intervalAt(1);
        REQUIRE(t.intervals.removeRowAt(1));
        CHECK(t.intervals.intervalAt(1) != second);
        CHECK(t.copy.readBack().intervals.size() == original.intervals.size() - 1);
        CHECK(t.stack().undoText() ==
              QStringLiteral("remove interval %1-%2 m")
                  .arg(QString::fromStdString(numberText(second.top_m)),
                       QString::fromStdString(numberText(second.base_m))));
        t.stack().undo();
        CHECK(t.copy.readBack() == original);
        CHECK(t.intervals.intervalAt(1) == second);
    }
}

TEST_CASE("the desk's row actions follow the current tab", "[view][desk][tables]") {
    DemoCopy copy;
    const std::size_t stored_samples = copy.readBack().samples.size();
    LoggingDesk desk;
    REQUIRE(desk.openProject(copy.qpath()));
    QTabWidget *tabs = desk.tabs();
    REQUIRE(tabs->count() == 7);
    tabs->setCurrentWidget(desk.samplesView());
    CHECK(desk.addRowAction()->text() == QLatin1String("Add sample"));
    CHECK(desk.removeRowAction()->text() == QLatin1String("Remove sample"));
    const int samples = desk.samplesModel()->rowCount();
    desk.addRowAction()->trigger();
    CHECK(desk.samplesModel()->rowCount() == samples + 1);
    CHECK(desk.samplesView()->currentIndex().row() == samples); // the new row, opened
    desk.removeRowAction()->trigger(); // the current row: the new sample
    CHECK(desk.samplesModel()->rowCount() == samples);
    CHECK(copy.readBack().samples.size() == stored_samples);

    tabs->setCurrentWidget(desk.eventsView());
    CHECK(desk.addRowAction()->text() == QLatin1String("Add event"));
    desk.eventsView()->setCurrentIndex(desk.eventsModel()->index(0, 0));
    desk.removeRowAction()->trigger(); // used by zones: refused, shown on the refusal line
    CHECK(desk.refusalLine()->text().contains(QLatin1String("remove those zones first")));

    tabs->setCurrentWidget(desk.intervalsView());
    CHECK(desk.addRowAction()->text() == QLatin1String("Add interval"));
    const int intervals = desk.intervalsModel()->rowCount();
    desk.addRowAction()->trigger(); // as Add interval
    CHECK(desk.intervalsModel()->rowCount() == intervals + 1);

    desk.runsView()->setCurrentIndex(QModelIndex());
    desk.removeRunAction()->trigger();
    CHECK(desk.refusalLine()->text().contains(QLatin1String("no run is selected")));
    const int runs = desk.runsModel()->rowCount();
    desk.addRunAction()->trigger();
    CHECK(desk.runsModel()->rowCount() == runs + 1);
    desk.removeRunAction()->trigger(); // the new run is current
    CHECK(desk.runsModel()->rowCount() == runs);
}
