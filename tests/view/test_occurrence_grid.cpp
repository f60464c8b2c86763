// The logging desk's occurrence grid (samples x taxa) on a copy of the demo project: the cell
// text syntax, the model tester while editing, add / update / remove of occurrences through
// cells with undo and redo checked against the file read back by a fresh connection, refusals
// (the field, the fix, the file untouched), the taxon columns. The "[.look]" case writes
// $TMPDIR/desk-grid.png and desk-dates.png (default /tmp) for a look at those tabs.
#include "desk_fixture.hpp"

#include "view/desk_project.hpp"
#include "view/desk_table_model.hpp"
#include "view/desk_table_view.hpp"
#include "view/logging_desk.hpp"
#include "view/main_window.hpp"
#include "view/occurrence_cell.hpp"
#include "view/occurrence_grid_model.hpp"

#include "atollog/db/project_edits.hpp"

#include <SQLiteCpp/Database.h>

#include <QApplication>
#include <QDir>
#include <QLineEdit>
#include <QSignalSpy>
#include <QTabWidget>
#include <QTest>
#include <QUndoStack>

#include <algorithm>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

struct Grid {
    DemoCopy copy;
    DeskProject project;
    OccurrenceGridModel grid{project};
    explicit Grid(const std::string &hole = "KAL1") {
        REQUIRE(project.open(copy.qpath()));
        grid.setHole(hole);
        REQUIRE(grid.rowCount() > 0);
        REQUIRE(grid.columnCount() > 0);
    }
    QModelIndex cell(const std::string &sample, const std::string &taxon) const {
        const int r = grid.rowOf(sample);
        const int c = grid.columnOf(taxon);
        REQUIRE(r >= 0);
        REQUIRE(c >= 0);
        return grid.index(r, c);
    }
    QString text(const std::string &sample, const std::string &taxon) const {
        return cell(sample, taxon).data().toString();
    }
    bool type(const std::string &sample, const std::string &taxon, const QString &t) {
        return grid.setData(cell(sample, taxon), t);
    }
    QUndoStack &stack() { return *project.undoStack(); }
};

std::vector<Occurrence> occurrencesOf(const CoreDataset &data, const std::string &sample,
                                      const std::string &taxon) {
    std::vector<Occurrence> out;
    for (const Occurrence &o : data.occurrences) {
        if (o.sample == sample && o.taxon == taxon) out.push_back(o);
    }
    return out;
}

/// A taxon of the project with no occurrence in `sample` but a column in the grid.
std::string emptyColumn(const Grid &g, const std::string &sample) {
    for (int c = 0; c < g.grid.columnCount(); ++c) {
        if (g.grid.index(g.grid.rowOf(sample), c).data().toString().isEmpty()) {
            return g.grid.taxonAt(c);
        }
    }
    FAIL("no empty cell in the row of " << sample);
    return {};
}

} // namespace

TEST_CASE("occurrence cell text is read back to what was written", "[view][desk][grid]") {
    OccurrenceCell cell;
    cell[OccurrenceStatus::InPlace] = Abundance{std::int64_t{25}};
    cell[OccurrenceStatus::Reworked] = Abundance{AbundanceClass::Rare};
    cell[OccurrenceStatus::Caved] = std::nullopt;
    const QString text = occurrenceCellText(cell);
    CHECK(text == QLatin1String("25; rare rw; x cv"));
    const auto back = readOccurrenceCell(text);
    REQUIRE(std::holds_alternative<OccurrenceCell>(back));
    CHECK(std::get<OccurrenceCell>(back) == cell);

    // The full status words and free spacing are read too; case does not matter.
    const auto words = readOccurrenceCell(QStringLiteral(" Common  reworked ;12"));
    REQUIRE(std::holds_alternative<OccurrenceCell>(words));
    CHECK(occurrenceCellText(std::get<OccurrenceCell>(words)) == QLatin1String("12; common rw"));
    CHECK(std::get<OccurrenceCell>(readOccurrenceCell(QString())).empty());

    SECTION("what cannot be read says what and how to type it") {
        const auto lots = readOccurrenceCell(QStringLiteral("lots"));
        REQUIRE(std::holds_alternative<QString>(lots));
        CHECK(std::get<QString>(lots).contains(QLatin1String("'lots' is not an abundance")));
        CHECK(std::get<QString>(lots).contains(QLatin1String("rw for reworked")));
        const auto mark = std::get<QString>(readOccurrenceCell(QStringLiteral("12 zz")));
        CHECK(mark.contains(QLatin1String("'zz' is not a status mark")));
        const auto twice = std::get<QString>(readOccurrenceCell(QStringLiteral("12; 3")));
        CHECK(twice.contains(QLatin1String("in_place status twice")));
        CHECK(std::holds_alternative<QString>(readOccurrenceCell(QStringLiteral("1.5"))));
    }
}

TEST_CASE("the grid holds the hole's samples in depth order and its taxa", "[view][desk][grid]") {
    Grid g;
    const CoreDataset data = g.copy.readBack();
    std::vector<const Sample *> kal1;
    for (const Sample &s : data.samples) {
        if (s.hole == "KAL1") kal1.push_back(&s);
    }
    REQUIRE(g.grid.rowCount() == static_cast<int>(kal1.size()));
    for (int r = 1; r < g.grid.rowCount(); ++r) {
        const auto top = [&](int row) {
            return (*std::find_if(kal1.begin(), kal1.end(), [&](const Sample *s) {
                       return s->sample == g.grid.sampleAt(row);
                   }))->top_m;
        };
        CHECK(top(r - 1) <= top(r));
    }
    // Every occurrence of a KAL1 sample has its cell, and the cell says what the file holds
    // (demo data: KAL1-001 lists VACR-RAM as abundant, MARG-OSS as 25, both in place).
    int listed = 0;
    for (const Occurrence &o : data.occurrences) {
        if (g.grid.rowOf(o.sample) >= 0) {
            ++listed;
            CHECK(g.grid.columnOf(o.taxon) >= 0);
        }
    }
    CHECK(listed > 0);
    CHECK(g.text("KAL1-001", "VACR-RAM") == QLatin1String("abundant"));
    CHECK(g.text("KAL1-001", "MARG-OSS") == QLatin1String("25"));
    CHECK(g.grid.headerData(g.grid.columnOf("VACR-RAM"), Qt::Horizontal, Qt::ToolTipRole)
              .toString()
              .contains(QLatin1String("Vessacropa ramulosa")));
    // No sample of another hole is a row.
    for (const Sample &s : data.samples) {
        if (s.hole != "KAL1") CHECK(g.grid.rowOf(s.sample) < 0);
    }
}

TEST_CASE("the grid passes the model tester while logging", "[view][desk][grid]") {
    ModelTesterLog log;
    Grid g;
    QAbstractItemModelTester tester(&g.grid, QAbstractItemModelTester::FailureReportingMode::Warning);
    const std::string taxon = emptyColumn(g, "KAL1-002");
    CHECK(g.type("KAL1-002", taxon, QStringLiteral("7")));
    CHECK(g.type("KAL1-002", taxon, QStringLiteral("few; 2 rw")));
    CHECK_FALSE(g.type("KAL1-002", taxon, QStringLiteral("-4")));
    CHECK_FALSE(g.type("KAL1-002", taxon, QStringLiteral("heaps")));
    CHECK(g.type("KAL1-002", taxon, QString()));
    std::vector<std::string> ids;
    g.grid.taxaWithoutColumn(&ids);
    REQUIRE_FALSE(ids.empty());
    CHECK(g.grid.addTaxon(ids.front()));
    CHECK(g.type("KAL1-002", ids.front(), QStringLiteral("x")));
    for (int i = 0; i < 4; ++i) g.stack().undo();
    for (int i = 0; i < 4; ++i) g.stack().redo();
    g.grid.setHole("TOR1");
    g.grid.setHole("NO-SUCH-HOLE");
    CHECK(g.grid.rowCount() == 0);
    CHECK(g.grid.columnCount() == 0);
    INFO(log.messages().join(QLatin1Char('\n')).toStdString());
    CHECK(log.messages().isEmpty());
}

TEST_CASE("adding, changing and clearing a cell, undone and redone, is what the file holds",
          "[view][desk][grid]") {
    Grid g;
    const std::string sample = "KAL1-003";
    const std::string taxon = emptyColumn(g, sample);
    const CoreDataset original = g.copy.readBack();
    REQUIRE(occurrencesOf(original, sample, taxon).empty());

    // Empty -> one occurrence added.
    REQUIRE(g.type(sample, taxon, QStringLiteral("12")));
    const CoreDataset one = g.copy.readBack();
    auto found = occurrencesOf(one, sample, taxon);
    REQUIRE(found.size() == 1);
    CHECK(found[0].abundance == std::optional<Abundance>(std::int64_t{12}));
    CHECK(found[0].status == OccurrenceStatus::InPlace);
    CHECK(one.occurrences.size() == original.occurrences.size() + 1);
    CHECK(g.text(sample, taxon) == QLatin1String("12"));

    // Changed: 12 -> common (an update) and a reworked entry (an add), one undo step.
    REQUIRE(g.type(sample, taxon, QStringLiteral("common; 3 rw")));
    const CoreDataset two = g.copy.readBack();
    found = occurrencesOf(two, sample, taxon);
    REQUIRE(found.size() == 2);
    CHECK(found[0].abundance == std::optional<Abundance>(AbundanceClass::Common));
    CHECK(found[1].abundance == std::optional<Abundance>(std::int64_t{3}));
    CHECK(found[1].status == OccurrenceStatus::Reworked);
    CHECK(g.text(sample, taxon) == QLatin1String("common; 3 rw"));
    CHECK(g.stack().count() == 2);

    // Cleared: both removed in one step.
    REQUIRE(g.type(sample, taxon, QString()));
    CHECK(g.copy.readBack() == original);
    CHECK(g.text(sample, taxon).isEmpty());
    CHECK(g.grid.columnOf(taxon) >= 0); // the column stays while the hole is chosen

    g.stack().undo(); // the clearing
    CHECK(g.copy.readBack() == two);
    CHECK(g.text(sample, taxon) == QLatin1String("common; 3 rw"));
    g.stack().undo(); // the change
    CHECK(g.copy.readBack() == one);
    CHECK(g.text(sample, taxon) == QLatin1String("12"));
    g.stack().undo(); // the add
    CHECK(g.copy.readBack() == original);
    CHECK(g.text(sample, taxon).isEmpty());
    g.stack().redo();
    g.stack().redo();
    CHECK(g.copy.readBack() == two);
    CHECK(g.text(sample, taxon) == QLatin1String("common; 3 rw"));
    g.stack().redo();
    CHECK(g.copy.readBack() == original);

    SECTION("a stored occurrence keeps its place when removed and put back") {
        // KAL1-001's VACR-RAM is the first occurrence of the file (demo data).
        const CoreDataset before = g.copy.readBack();
        REQUIRE(before.occurrences.front().taxon == "VACR-RAM");
        REQUIRE(g.type("KAL1-001", "VACR-RAM", QString()));
        CHECK(occurrencesOf(g.copy.readBack(), "KAL1-001", "VACR-RAM").empty());
        g.stack().undo();
        CHECK(g.copy.readBack() == before); // same rows, same order
        REQUIRE(g.type("KAL1-001", "VACR-RAM", QStringLiteral("dominant")));
        const CoreDataset changed = g.copy.readBack();
        CHECK(changed.occurrences.front().abundance ==
              std::optional<Abundance>(AbundanceClass::Dominant));
        CHECK(changed.occurrences.size() == before.occurrences.size()); // an update, in place
    }
}

TEST_CASE("refused cells leave the file as it was and say why", "[view][desk][grid]") {
    Grid g;
    const std::string sample = "KAL1-004";
    const std::string taxon = emptyColumn(g, sample);
    REQUIRE(g.type("KAL1-001", "MARG-OSS", QStringLiteral("25"))); // same value: no write
    CHECK(g.stack().count() == 0);
    const std::string main_bytes = fileBytes(g.copy.path());
    const std::string wal_bytes = fileBytes(g.copy.path().string() + "-wal");
    const CoreDataset before = g.copy.readBack();
    QSignalSpy refused(&g.grid, &OccurrenceGridModel::editRefused);
    bool nothing_written = true; // else: written and taken back, the data as before

    SECTION("a negative count: the engine's rule, field and fix") {
        CHECK_FALSE(g.type(sample, taxon, QStringLiteral("-3")));
        const QString message = g.cell(sample, taxon).data(kCellMessageRole).toString();
        INFO(message.toStdString());
        CHECK(message.contains(QLatin1String("abundance")));
        CHECK(message.contains(QLatin1String("is negative")));
        CHECK(message.contains(QLatin1String("give a whole count of 0 or more")));
        CHECK(message.count(QLatin1String("in sample")) == 1); // the row named once
        CHECK(g.project.lastWasRefusal());
        CHECK(g.cell(sample, taxon).data(Qt::ToolTipRole).toString() == message);
    }
    SECTION("a word that is no abundance, refused before any write") {
        CHECK_FALSE(g.type(sample, taxon, QStringLiteral("plenty")));
        const QString message = g.cell(sample, taxon).data(kCellMessageRole).toString();
        CHECK(message.contains(QString::fromStdString("taxon '" + taxon + "' in sample 'KAL1-004'")));
        CHECK(message.contains(QLatin1String("'plenty' is not an abundance")));
        CHECK(message.contains(QLatin1String("present, rare, few, common, abundant, dominant")));
    }
    SECTION("two edits of one cell, the second refused: all or nothing") {
        // The in-place 25 is removed (accepted), then a reworked -1 added (refused): the
        // removal is taken back, so neither reaches the file.
        CHECK_FALSE(g.type("KAL1-001", "MARG-OSS", QStringLiteral("-1 rw")));
        CHECK(g.project.lastMessage().contains(QLatin1String("is negative")));
        nothing_written = false;
        CHECK(g.text("KAL1-001", "MARG-OSS") == QLatin1String("25"));
    }
    CHECK(refused.count() == 1);
    CHECK(g.stack().count() == 0);
    if (nothing_written) {
        CHECK(fileBytes(g.copy.path()) == main_bytes);
        CHECK(fileBytes(g.copy.path().string() + "-wal") == wal_bytes);
    }
    CHECK(g.copy.readBack() == before);
    CHECK(integrity(g.copy.path()) == "ok");
    // The next accepted edit clears the mark.
    REQUIRE(g.type(sample, taxon, QStringLiteral("1")));
    CHECK_FALSE(g.cell(sample, taxon).data(kCellMessageRole).isValid());
}

TEST_CASE("a cell of a sample another writer renamed is refused, then shown renamed",
          "[view][desk][grid]") {
    Grid g;
    const std::string taxon = emptyColumn(g, "KAL1-005");
    {
        // Another connection renames the sample; its occurrences follow the stored id.
        db::ProjectStore other = db::ProjectStore::open(g.copy.path());
        const CoreDataset data = other.loadDataset();
        const auto s = std::find_if(data.samples.begin(), data.samples.end(),
                                    [](const Sample &x) { return x.sample == "KAL1-005"; });
        REQUIRE(s != data.samples.end());
        Sample renamed = *s;
        renamed.sample = "KAL1-005B";
        db::applyEdit(other, db::RowEdit::update(*s, renamed));
    }
    const CoreDataset before = g.copy.readBack();
    const std::string main_bytes = fileBytes(g.copy.path());
    const std::string wal_bytes = fileBytes(g.copy.path().string() + "-wal");
    CHECK_FALSE(g.type("KAL1-005", taxon, QStringLiteral("3")));
    const QString message = g.project.lastMessage();
    INFO(message.toStdString());
    CHECK(message.contains(QLatin1String("KAL1-005")));
    CHECK(message.contains(QLatin1String("sample")));
    CHECK(fileBytes(g.copy.path()) == main_bytes);
    CHECK(fileBytes(g.copy.path().string() + "-wal") == wal_bytes);
    CHECK(g.copy.readBack() == before);
    // The refusal read the file again: the grid now shows the sample under its new id.
    CHECK(g.grid.rowOf("KAL1-005") < 0);
    CHECK(g.grid.rowOf("KAL1-005B") >= 0);
    CHECK(g.project.undoStack()->count() == 0);
}

TEST_CASE("a taxon column is added from the project's taxa", "[view][desk][grid]") {
    Grid g;
    std::vector<std::string> ids;
    const QStringList labels = g.grid.taxaWithoutColumn(&ids);
    REQUIRE(labels.size() == static_cast<int>(ids.size()));
    REQUIRE_FALSE(ids.empty());
    const CoreDataset data = g.copy.readBack();
    // Exactly the taxa of the taxa table with no column.
    CHECK(static_cast<int>(ids.size()) + g.grid.columnCount() == static_cast<int>(data.taxa.size()));
    const int before = g.grid.columnCount();
    CHECK(g.grid.addTaxon(ids.front()));
    CHECK(g.grid.columnCount() == before + 1);
    CHECK(g.grid.taxonAt(before) == ids.front());
    CHECK(g.grid.addTaxon(ids.front())); // there already: nothing changes
    CHECK(g.grid.columnCount() == before + 1);
    REQUIRE(g.type("KAL1-005", ids.front(), QStringLiteral("rare cv")));
    const auto found = occurrencesOf(g.copy.readBack(), "KAL1-005", ids.front());
    REQUIRE(found.size() == 1);
    CHECK(found[0].status == OccurrenceStatus::Caved);
    // Caved or reworked only: shown grey; the tooltip spells the entry out.
    CHECK(g.cell("KAL1-005", ids.front()).data(Qt::ForegroundRole).isValid());
    CHECK(g.cell("KAL1-005", ids.front()).data(Qt::ToolTipRole).toString().contains(
        QLatin1String("caved: rare")));
    CHECK_FALSE(g.cell("KAL1-001", "MARG-OSS").data(Qt::ForegroundRole).isValid());

    CHECK_FALSE(g.grid.addTaxon("NOT-A-TAXON"));
    CHECK(g.project.lastMessage().contains(QLatin1String("not in the taxa table")));
    CHECK(g.grid.columnCount() == before + 1);
}

TEST_CASE("the desk's grid tab: add a taxon column and type into it", "[view][desk][grid]") {
    DemoCopy copy;
    LoggingDesk desk;
    desk.resize(1200, 500);
    desk.show();
    REQUIRE(QTest::qWaitForWindowExposed(&desk));
    QApplication::setActiveWindow(&desk);
    REQUIRE(desk.openProject(copy.qpath()));
    std::vector<std::string> ids;
    desk.occurrencesModel()->taxaWithoutColumn(&ids);
    REQUIRE_FALSE(ids.empty());
    REQUIRE(desk.addTaxonColumn(ids.front()));
    CHECK(desk.tabs()->currentWidget() == desk.occurrencesView());
    CHECK(desk.addTaxonAction()->isEnabled());
    CHECK_FALSE(desk.addRowAction()->isEnabled()); // rows of the grid are the samples
    const QModelIndex opened = desk.occurrencesView()->currentIndex();
    CHECK(opened.column() == desk.occurrencesModel()->columnOf(ids.front()));
    auto *editor = qobject_cast<QLineEdit *>(QApplication::focusWidget());
    REQUIRE(editor);
    QTest::keyClicks(editor, QStringLiteral("4 rw"));
    QTest::keyClick(editor, Qt::Key_Tab);
    const auto found = occurrencesOf(copy.readBack(), desk.occurrencesModel()->sampleAt(0),
                                     ids.front());
    REQUIRE(found.size() == 1);
    CHECK(found[0].status == OccurrenceStatus::Reworked);
    CHECK(found[0].abundance == std::optional<Abundance>(std::int64_t{4}));
}

TEST_CASE("screenshot of the desk's occurrence grid", "[.look]") {
    DemoCopy copy;
    MainWindow window;
    window.setMessageSink([](const QString &, const QString &) {});
    window.resize(1500, 1000);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    REQUIRE(window.openProject(copy.qpath()));
    LoggingDesk *desk = window.loggingDesk();
    desk->tabs()->setCurrentWidget(desk->occurrencesView());
    OccurrenceGridModel *grid = desk->occurrencesModel();
    grid->setData(grid->index(1, 0), QStringLiteral("common; 2 rw"));
    grid->setData(grid->index(2, 1), QStringLiteral("-2")); // a refusal to show
    const QString path = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                             .filePath(QStringLiteral("desk-grid.png"));
    QTest::qWait(200);
    REQUIRE(window.grab().save(path));
    WARN("screenshot: " << path.toStdString());
    // The dates tab too, for a look at its columns.
    desk->tabs()->setCurrentWidget(desk->datesView());
    const QString dates = QDir(qEnvironmentVariable("TMPDIR", QStringLiteral("/tmp")))
                              .filePath(QStringLiteral("desk-dates.png"));
    QTest::qWait(100);
    REQUIRE(desk->grab().save(dates));
    WARN("screenshot: " << dates.toStdString());
}
