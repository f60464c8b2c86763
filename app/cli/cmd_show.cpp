// `show`: per hole, how much was cored and recovered, what rock, how much was sampled.
#include "cli/command.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/hole_summary.hpp"

#include <filesystem>
#include <memory>
#include <ostream>
#include <set>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

std::vector<HoleSummary> selectHoles(std::vector<HoleSummary> all, const std::string& hole) {
    if (hole.empty()) return all;
    for (auto& s : all)
        if (s.hole == hole) return {std::move(s)};
    std::string known;
    for (const auto& s : all) known += (known.empty() ? "" : ", ") + s.hole;
    throw std::invalid_argument("no hole '" + hole + "' in the project; holes are: " + known);
}

void printClassBreakdown(std::ostream& out, const HoleSummary& s) {
    using A = TablePrinter::Align;
    TablePrinter table({{"  class"}, {"thickness_m", A::Right}, {"share_pct", A::Right}});
    for (const auto& [word, thickness_m] : s.thickness_by_class_m)
        table.addRow({"  " + word, formatFixed(thickness_m, 2),
                      formatFixed(s.logged_m > 0 ? 100.0 * thickness_m / s.logged_m : 0.0, 1)});
    table.printText(out);
}

} // namespace

CommandRun addShowCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string hole;
        bool csv = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "show", "Per hole: runs, cored and recovered metres, recovery, logged thickness by "
                "texture, samples, taxa, exposure surfaces.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "Only this hole");
    sub->add_flag("--csv", o->csv,
                  "Print one CSV table (thickness by class as thickness_<class>_m columns)");
    return [o, &io]() {
        const auto store = db::ProjectStore::open(o->project);
        const auto summaries = selectHoles(summarizeHoles(store.loadDataset()), o->hole);

        std::set<std::string> classes;
        for (const auto& s : summaries)
            for (const auto& [word, t] : s.thickness_by_class_m) classes.insert(word);

        using A = TablePrinter::Align;
        std::vector<TablePrinter::Column> columns{
            {"hole"}, {"site"}, {"runs", A::Right}, {"cored_m", A::Right},
            {"recovered_m", A::Right}, {"recovery_pct", A::Right}, {"logged_m", A::Right},
            {"samples", A::Right}, {"taxa", A::Right}, {"exposure_surfaces", A::Right}};
        if (o->csv)
            for (const auto& c : classes) columns.push_back({"thickness_" + c + "_m", A::Right});
        TablePrinter table(columns);
        for (const auto& s : summaries) {
            std::vector<std::string> row{s.hole, s.site, std::to_string(s.run_count),
                                         formatFixed(s.cored_m, 2), formatFixed(s.recovered_m, 2),
                                         formatFixed(s.recovery_pct, 1), formatFixed(s.logged_m, 2),
                                         std::to_string(s.sample_count), std::to_string(s.taxon_count),
                                         std::to_string(s.exposure_surface_count)};
            if (o->csv)
                for (const auto& c : classes) {
                    const auto it = s.thickness_by_class_m.find(c);
                    row.push_back(formatFixed(it == s.thickness_by_class_m.end() ? 0.0 : it->second, 2));
                }
            table.addRow(std::move(row));
        }
        if (o->csv) {
            table.printCsv(io.out);
            return int(kOk);
        }
        table.printText(io.out);
        for (const auto& s : summaries) {
            io.out << "\n" << s.hole << ": logged thickness by texture or rock\n";
            printClassBreakdown(io.out, s);
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
