// The main window's file actions: a new project, a core data folder imported (all or nothing)
// and written out, each failure a message naming the file and the fix with nothing changed.
// The exported folder must be the one `atollog export` writes.
#include "cli/cli_runner.hpp"

#include "view/main_window.hpp"

#include "atollog/db/project_store.hpp"

#include <QDir>

#include <catch2/catch.hpp>

#include <fstream>
#include <map>
#include <sstream>

using namespace atollog;

namespace {

const std::string kDemoFolder = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";

std::map<std::string, std::string> filesOf(const std::filesystem::path &dir) {
    std::map<std::string, std::string> files;
    for (const auto &entry : std::filesystem::directory_iterator(dir)) {
        std::ifstream in(entry.path(), std::ios::binary);
        std::ostringstream bytes;
        bytes << in.rdbuf();
        files[entry.path().filename().string()] = bytes.str();
    }
    return files;
}

std::string hashOf(const std::filesystem::path &project) {
    return db::ProjectStore::datasetHash(db::ProjectStore::open(project).loadDataset());
}

struct Window {
    QStringList messages;
    view::MainWindow window;
    Window() {
        window.setMessageSink([this](const QString &t, const QString &m) { messages << t + ": " + m; });
    }
};

QString q(const std::filesystem::path &p) { return QString::fromStdString(p.string()); }

} // namespace

TEST_CASE("A new project is created empty, then filled from a core data folder",
          "[view][files]") {
    test::TempDir dir("view-files");
    const auto project = dir / "new.atollog";
    Window w;
    REQUIRE(w.window.createProject(q(project)));
    INFO(w.messages.join('\n').toStdString());
    CHECK(w.messages.isEmpty());
    CHECK(w.window.projectPath() == q(std::filesystem::absolute(project)));
    CHECK(w.window.shownInput().columns.empty());
    CHECK_FALSE(db::ProjectStore::open(project).hasData());

    REQUIRE(w.window.importFolder(QString::fromStdString(kDemoFolder), false));
    CHECK(w.messages.isEmpty());
    CHECK(w.window.shownInput().columns.size() == 4);
    // The same rows as the command line's import.
    const auto by_cli = dir / "cli.atollog";
    REQUIRE(test::runAtollog({"import", by_cli.string(), kDemoFolder}).exit_code == 0);
    CHECK(hashOf(project) == hashOf(by_cli));

    // A second project at the same path is refused.
    CHECK_FALSE(w.window.createProject(q(project)));
    REQUIRE(w.messages.size() == 1);
    CHECK(w.messages.front().contains("Cannot create the project"));
}

TEST_CASE("A refused import changes nothing and says where the folder is wrong",
          "[view][files][bad-input]") {
    test::TempDir dir("view-files-bad");
    const auto project = dir / "p.atollog";
    REQUIRE(test::runAtollog({"import", project.string(), kDemoFolder}).exit_code == 0);
    const std::string before = hashOf(project);
    Window w;
    REQUIRE(w.window.openProject(q(project)));

    // Without replace, a project with data is refused.
    CHECK_FALSE(w.window.importFolder(QString::fromStdString(kDemoFolder), false));
    REQUIRE(w.messages.size() == 1);
    CHECK(w.messages.back().contains("Nothing was imported"));
    CHECK(hashOf(project) == before);

    // With replace, a folder with a bad cell is refused naming file, line and column.
    const auto bad = dir / "bad";
    std::filesystem::copy(kDemoFolder, bad);
    {
        std::ifstream in(bad / "runs.csv");
        std::ostringstream text;
        text << in.rdbuf();
        std::string s = text.str();
        const std::string row = "KAL1,KAL1-R02,2.1,4.5,0.91";
        REQUIRE(s.find(row) != std::string::npos);
        s.replace(s.find(row), row.size(), "KAL1,KAL1-R02,2.1,4.5,lots");
        std::ofstream(bad / "runs.csv", std::ios::trunc) << s;
    }
    CHECK_FALSE(w.window.importFolder(q(bad), true));
    REQUIRE(w.messages.size() == 2);
    INFO(w.messages.back().toStdString());
    CHECK(w.messages.back().contains("runs.csv"));
    CHECK(w.messages.back().contains("lots"));
    CHECK(w.messages.back().contains("runs.csv:3: column recovered_m (5)"));
    CHECK(hashOf(project) == before);
}

TEST_CASE("An exported folder is the command line's export", "[view][files]") {
    test::TempDir dir("view-files-export");
    const auto project = dir / "p.atollog";
    REQUIRE(test::runAtollog({"import", project.string(), kDemoFolder}).exit_code == 0);
    Window w;
    REQUIRE(w.window.openProject(q(project)));
    const auto by_view = dir / "by-view";
    REQUIRE(w.window.exportFolder(q(by_view), false));
    const auto by_cli = dir / "by-cli";
    REQUIRE(test::runAtollog({"export", project.string(), by_cli.string()}).exit_code == 0);
    CHECK(filesOf(by_view) == filesOf(by_cli));

    // A folder that is not empty needs overwrite; refused, it is left as it was.
    const auto files = filesOf(by_view);
    CHECK_FALSE(w.window.exportFolder(q(by_view), false));
    REQUIRE(w.messages.size() == 1);
    CHECK(w.messages.front().contains("Nothing was exported"));
    CHECK(filesOf(by_view) == files);
    CHECK(w.window.exportFolder(q(by_view), true));
}
