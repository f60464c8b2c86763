// EditCommand and pushEdit on their own: a refused edit never enters the stack; undo and redo
// are inverse edits, each checked against the file; an undo that another writer has made
// impossible becomes a message and drops the command, and the file keeps that writer's change.
#include "desk_fixture.hpp"

#include "view/edit_command.hpp"

#include "atollog/db/project_edits.hpp"

#include <QUndoStack>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

CoreRun firstRun(const CoreDataset &data) { return data.runs.at(0); }

} // namespace

TEST_CASE("a refused edit is not pushed; an accepted one undoes and redoes", "[view][desk]") {
    DemoCopy copy;
    db::ProjectStore store = db::ProjectStore::open(copy.path());
    const CoreDataset original = store.loadDataset();
    QUndoStack stack;
    QStringList failures;
    int writes = 0;
    EditCallbacks callbacks{[&](const QStringList &) { ++writes; },
                            [&](const QString &m) { failures << m; }};

    CoreRun bad = firstRun(original);
    bad.recovered_m = -0.5;
    CHECK_THROWS_AS(pushEdit(stack, store, db::RowEdit::update(firstRun(original), bad),
                             QStringLiteral("bad"), callbacks),
                    db::EditRefused);
    CHECK(stack.count() == 0);
    CHECK(copy.readBack() == original);

    CoreRun good = firstRun(original);
    good.recovered_m = 2.0;
    pushEdit(stack, store, db::RowEdit::update(firstRun(original), good), QStringLiteral("good"),
             callbacks);
    CHECK(stack.count() == 1);
    CHECK(writes == 0); // the push's redo wrote nothing: the edit was already applied
    const CoreDataset edited = copy.readBack();
    CHECK(firstRun(edited) == good);

    stack.undo();
    CHECK(copy.readBack() == original);
    stack.redo();
    CHECK(copy.readBack() == edited);
    CHECK(writes == 2);
    CHECK(failures.isEmpty());
    CHECK(stack.count() == 1);
}

TEST_CASE("an undo another writer has made impossible is a message, not a crash",
          "[view][desk]") {
    DemoCopy copy;
    db::ProjectStore store = db::ProjectStore::open(copy.path());
    const CoreDataset original = store.loadDataset();
    QUndoStack stack;
    QStringList failures;
    EditCallbacks callbacks{{}, [&](const QString &m) { failures << m; }};

    CoreRun mine = firstRun(original);
    mine.recovered_m = 2.0;
    pushEdit(stack, store, db::RowEdit::update(firstRun(original), mine),
             QStringLiteral("my recovery"), callbacks);
    // A second connection (another window, another logger) changes the same run.
    CoreRun theirs = mine;
    theirs.recovered_m = 1.5;
    {
        db::ProjectStore other = db::ProjectStore::open(copy.path());
        db::applyEdit(other, db::RowEdit::update(mine, theirs));
    }
    stack.undo(); // the inverse names the run as I left it: not found any more
    REQUIRE(failures.size() == 1);
    INFO(failures[0].toStdString());
    CHECK(failures[0].startsWith(QLatin1String("cannot undo \"my recovery\"")));
    CHECK(stack.count() == 0); // dropped: the stack no longer claims to hold that edit
    CHECK(firstRun(copy.readBack()) == theirs);
}
