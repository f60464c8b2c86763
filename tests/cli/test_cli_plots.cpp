// The --plot options of subsidence, rates, line and chain, on the demo archipelago: each writes
// a non-empty file of every format; bad values are refused with a message naming them.
#include "cli_runner.hpp"

#include <catch2/catch.hpp>

#include <QFile>
#include <QXmlStreamReader>

#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace {

const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";

std::string importedDemo(const TempDir& tmp) {
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    return p;
}

/// The first bytes of each format (PNG: ISO/IEC 15948 signature; PDF: ISO 32000-1 7.5.2 header;
/// SVG: an XML document whose root is <svg>).
void checkFigure(const std::filesystem::path& path) {
    CAPTURE(path.string());
    REQUIRE(std::filesystem::exists(path));
    REQUIRE(std::filesystem::file_size(path) > 500);
    std::ifstream in(path, std::ios::binary);
    std::string head(8, '\0');
    in.read(head.data(), 8);
    const std::string ext = path.extension().string();
    if (ext == ".png") {
        CHECK(head == std::string("\x89PNG\r\n\x1a\n", 8));
    } else if (ext == ".pdf") {
        CHECK(head.rfind("%PDF-", 0) == 0);
    } else {
        QFile file(QString::fromStdString(path.string()));
        REQUIRE(file.open(QIODevice::ReadOnly));
        QXmlStreamReader xml(&file);
        while (!xml.atEnd() && xml.readNext() != QXmlStreamReader::StartElement) {
        }
        CHECK(xml.name() == u"svg");
    }
}

const std::vector<std::string> kModel{"--draws", "400", "--outlier-draws", "0"};

std::vector<std::string> with(std::vector<std::string> args, const std::vector<std::string>& more) {
    args.insert(args.end(), more.begin(), more.end());
    return args;
}

} // namespace

TEST_CASE("subsidence, rates, line and chain draw their plots in every format",
          "[unit][cli][plots]") {
    TempDir tmp("plots");
    const auto p = importedDemo(tmp);
    for (const std::string ext : {".svg", ".png", ".pdf"}) {
        const auto sub = tmp / ("subsidence" + ext);
        auto r = runAtollog(with({"subsidence", p, "--plot", sub.string()}, kModel));
        INFO(r.err);
        REQUIRE(r.exit_code == 0);
        checkFigure(sub);

        for (const std::string along : {"depth", "age"}) {
            const auto rates = tmp / ("rates-" + along + ext);
            r = runAtollog(with({"rates", p, "--hole", "TOR1", "--plot", rates.string(),
                                 "--plot-along", along},
                                kModel));
            INFO(r.err);
            REQUIRE(r.exit_code == 0);
            checkFigure(rates);
        }

        const auto loc = tmp / ("line" + ext);
        r = runAtollog({"line", p, "--hole", "OSS1", "--with", "PEL1", "--plot", loc.string()});
        INFO(r.err);
        REQUIRE(r.exit_code == 0);
        checkFigure(loc);

        const auto chain = tmp / ("chain" + ext);
        r = runAtollog({"chain", p, "--plot", chain.string()});
        INFO(r.err);
        REQUIRE(r.exit_code == 0);
        checkFigure(chain);
    }
}

TEST_CASE("plot options refuse bad values naming them", "[unit][cli][plots]") {
    TempDir tmp("plots-bad");
    const auto p = importedDemo(tmp);
    const auto txt = (tmp / "figure.txt").string();
    for (const auto& args : std::vector<std::vector<std::string>>{
             {"subsidence", p, "--plot", txt},
             {"rates", p, "--hole", "TOR1", "--plot", txt},
             {"line", p, "--hole", "OSS1", "--with", "PEL1", "--plot", txt},
             {"chain", p, "--plot", txt}}) {
        CAPTURE(args[0]);
        const auto r = runAtollog(args);
        CHECK(r.exit_code == 2);
        CHECK(r.err.find("--plot") != std::string::npos);
        CHECK(r.err.find(".svg") != std::string::npos); // says which extensions it takes
        CHECK_FALSE(std::filesystem::exists(txt));
    }
    const auto no_hole = runAtollog({"rates", p, "--plot", (tmp / "r.svg").string()});
    CHECK(no_hole.exit_code == 2);
    CHECK(no_hole.err.find("give --hole") != std::string::npos);
    const auto along = runAtollog({"rates", p, "--hole", "TOR1", "--plot",
                                   (tmp / "r.svg").string(), "--plot-along", "sideways"});
    CHECK(along.exit_code != 0);
    CHECK(along.err.find("--plot-along") != std::string::npos);
    const auto composite = runAtollog(
        {"line", p, "--hole", "OSS1", "--composite", "--plot", (tmp / "l.svg").string()});
    CHECK(composite.exit_code != 0);
    CHECK(composite.err.find("--plot") != std::string::npos);
}
