#pragma once
// A fresh import of the demo archipelago per test case, for tests whose figures and analyses
// store runs (each case counts its own), and a file's bytes as text.
#include "cli/cli_runner.hpp"

#include "atollog/db/project_store.hpp"

#include <QString>

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

namespace atollog::view::test {

struct ImportedDemo {
    atollog::test::TempDir dir{"view-imported-demo"};
    std::filesystem::path project = dir / "demo.atollog";
    ImportedDemo() {
        const auto r = atollog::test::runAtollog(
            {"import", project.string(), std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago"});
        REQUIRE(r.exit_code == 0);
    }
    QString path() const { return QString::fromStdString(project.string()); }
    /// How many runs of `kind` ("age-model", "datums", "sequence") the project holds.
    std::size_t modelRuns(const std::string &kind) const {
        db::ProjectStore store = db::ProjectStore::open(project);
        std::size_t n = 0;
        for (const auto &run : store.modelRuns()) n += run.kind == kind ? 1 : 0;
        return n;
    }
};

inline std::string fileText(const std::filesystem::path &file) {
    std::ifstream in(file, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

} // namespace atollog::view::test
