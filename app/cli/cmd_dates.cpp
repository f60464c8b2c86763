// `dates`: every numerical date as an age with its uncertainty: U-Th solved from activity
// ratios, radiocarbon calibrated against the project's curve, the others as entered.
#include "cli/command.hpp"
#include "cli/date_options.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"

#include <filesystem>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

std::string rangesKa(const std::vector<AgeInterval>& ranges, bool csv) {
    std::string text;
    for (const auto& r : ranges)
        text += (text.empty() ? "" : " ") + formatNumber(r.young_ma * 1e3, csv, 3) + "-" +
                formatNumber(r.old_ma * 1e3, csv, 3);
    return text;
}

} // namespace

CommandRun addDatesCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string hole;
        bool csv = false;
        bool no_store = false;
        DateOptions dates;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "dates", "Numerical dates as ages: U-Th from activity ratios (closed-system equation, "
                 "Monte Carlo uncertainty, initial d234U screen), radiocarbon calibrated against "
                 "the project's curve, other methods as entered.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--hole", o->hole, "Only this hole");
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_flag("--no-store", o->no_store, "Do not record the run in the project");
    addDateOptions(*sub, o->dates);
    return [o, &io]() {
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        io.progress("computing date ages");
        const auto ages = computeDateAges(data, o->dates.settings());
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        TablePrinter table({{"hole"}, {"depth_m", A::Right}, {"deep_m", A::Right}, {"sample"},
                            {"method"}, {"age_ka", A::Right}, {"age_sd_ka", A::Right},
                            {"d234u_initial_permil", A::Right}, {"hpd95_ka"}, {"used"}, {"flags"}});
        std::size_t used = 0;
        std::vector<std::string> messages;
        for (const auto& d : ages) {
            if (!o->hole.empty() && d.hole != o->hole) continue;
            used += d.usable_for_model ? 1 : 0;
            table.addRow({d.hole, formatNumber(d.shallow_m, csv, 2), formatNumber(d.deep_m, csv, 2),
                          d.sample.value_or(""), std::string(toString(d.method)),
                          d.age_ka ? formatNumber(*d.age_ka, csv, 3) : "",
                          d.age_sd_ka ? formatNumber(*d.age_sd_ka, csv, 3) : "",
                          d.d234u_initial_permil ? formatNumber(*d.d234u_initial_permil, csv, 1) : "",
                          rangesKa(d.hpd_95, csv), d.usable_for_model ? "yes" : "no",
                          dateFlagsText(d)});
            for (const auto& m : d.messages)
                messages.push_back(d.hole + " " + d.sample.value_or(formatNumber(d.shallow_m, false, 2) + " m") +
                                   ": " + m);
        }
        table.print(io.out, csv);
        for (const auto& m : messages) io.err << "note: " << m << '\n';
        if (o->no_store) return int(kOk);

        db::ModelRunRecord run;
        run.kind = "dates";
        run.settings = o->dates.settingsText();
        run.seed = o->dates.seed;
        run.inputs_sha256 = db::ProjectStore::datasetHash(data);
        std::ostream& note = csv ? io.err : io.out;
        if (const auto same = db::sameLatestRun(store, run)) {
            note << "dates unchanged since run #" << same->id << '\n';
            return int(kOk);
        }
        run.summary = std::to_string(ages.size()) + " dates, " + std::to_string(used) +
                      " usable in age models";
        note << "recorded as run #" << store.recordModelRun(run) << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
