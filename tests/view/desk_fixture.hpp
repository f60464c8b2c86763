#pragma once
// Fixtures for the logging desk tests: the demo archipelago imported once through the command
// line library, and a fresh copy of that project per test (edits change the file); the model
// tester's complaints collected, so a test can require there were none.
#include "cli/cli_runner.hpp"

#include "atollog/db/project_store.hpp"

#include <SQLiteCpp/Database.h>

#include <QAbstractItemModelTester>
#include <QUndoStack>
#include <QStringList>

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <iterator>
#include <string>

namespace atollog::view::test {

/// The demo imported once per test run (importing runs the whole validation).
inline const std::filesystem::path &importedDemo() {
    static atollog::test::TempDir dir("desk-demo");
    static const std::filesystem::path project = [] {
        const auto p = dir / "demo.atollog";
        const auto r = atollog::test::runAtollog(
            {"import", p.string(), std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago"});
        REQUIRE(r.exit_code == 0);
        return p;
    }();
    return project;
}

/// A copy of the imported demo in its own folder, removed with the object.
class DemoCopy {
  public:
    DemoCopy() : dir_("desk-copy") {
        const std::filesystem::path &from = importedDemo();
        path_ = dir_ / "demo.atollog";
        std::filesystem::copy_file(from, path_);
        // The importer closed its connection, which folds the -wal into the file; copy one
        // anyway if it is there, since the file alone would then be an older state.
        for (const char *suffix : {"-wal"}) {
            if (std::filesystem::exists(from.string() + suffix)) {
                std::filesystem::copy_file(from.string() + suffix, path_.string() + suffix);
            }
        }
    }
    const std::filesystem::path &path() const { return path_; }
    QString qpath() const { return QString::fromStdString(path_.string()); }
    /// The dataset as a fresh connection reads it from disk.
    CoreDataset readBack() const { return db::ProjectStore::open(path_).loadDataset(); }

  private:
    atollog::test::TempDir dir_;
    std::filesystem::path path_;
};

inline std::string fileBytes(const std::filesystem::path &file) {
    std::ifstream in(file, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

/// PRAGMA integrity_check of the file on a read-only connection: "ok" when intact.
inline std::string integrity(const std::filesystem::path &file) {
    SQLite::Database db(file.string(), SQLite::OPEN_READONLY);
    return db.execAndGet("PRAGMA integrity_check").getString();
}

/// Checks that a refusal wrote nothing: main and -wal bytes, the stack, integrity.
struct Untouched {
    const DemoCopy &copy;
    QUndoStack &stack;
    std::string main = fileBytes(copy.path());
    std::string wal = fileBytes(copy.path().string() + "-wal");
    int count = stack.count();
    void check() const {
        CHECK(fileBytes(copy.path()) == main);
        CHECK(fileBytes(copy.path().string() + "-wal") == wal);
        CHECK(stack.count() == count);
        CHECK(integrity(copy.path()) == "ok");
    }
};

/// Collects QAbstractItemModelTester's reports (category qt.modeltest) while alive.
class ModelTesterLog {
  public:
    ModelTesterLog() {
        messages().clear();
        previous_ = qInstallMessageHandler(&ModelTesterLog::handle);
    }
    ~ModelTesterLog() { qInstallMessageHandler(previous_); }
    ModelTesterLog(const ModelTesterLog &) = delete;
    ModelTesterLog &operator=(const ModelTesterLog &) = delete;
    static QStringList &messages() {
        static QStringList list;
        return list;
    }

  private:
    static void handle(QtMsgType, const QMessageLogContext &context, const QString &text) {
        if (context.category && QLatin1String(context.category).startsWith(QLatin1String("qt.modeltest"))) {
            messages() << text;
        }
    }
    QtMessageHandler previous_ = nullptr;
};

} // namespace atollog::view::test
