// `isochrons`: where given ages lie in every hole (depth quantiles from each hole's age-depth
// model), and where given events were picked in every hole (tie lines between columns).
#include "cli/age_list.hpp"
#include "cli/age_model_inputs.hpp"
#include "cli/command.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/isochrons.hpp"

#include <filesystem>
#include <cmath>
#include <memory>
#include <ostream>
#include <sstream>
#include <stdexcept>

namespace fs = std::filesystem;

namespace atollog::cli {


CommandRun addIsochronsCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string ages;
        std::vector<std::string> events;
        bool csv = false;
        AgeModelOptions model;
        bool no_dates = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "isochrons", "Isochrons: the depth of each given age in every hole with its 95 % range, "
                     "from each hole's age-depth model; and event tie lines: where each given "
                     "event was picked in every hole.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--ages-ma", o->ages, "Ages in Ma, separated by commas (e.g. 0.125,0.4)");
    sub->add_option("--events", o->events, "Events whose picks to tie across holes")
        ->delimiter(',');
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    addAgeModelOptions(*sub, o->model);
    return [o, &io]() {
        if (o->ages.empty() && o->events.empty())
            throw std::invalid_argument("give --ages-ma AGES and/or --events EVENTS");
        const auto store = db::ProjectStore::open(o->project);
        const CoreDataset data = store.loadDataset();
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        if (!o->ages.empty()) {
            const std::vector<double> ages = parseAgeList(o->ages, "--ages-ma");
            TablePrinter t({{"age_ma", A::Right}, {"hole"}, {"depth_q025_m", A::Right},
                            {"depth_q500_m", A::Right}, {"depth_q975_m", A::Right}, {"where"}});
            io.progress("building age-depth models");
            std::vector<std::pair<std::string, AgeModel>> models;
            for (const auto& in : gatherAgeModelInputs(data, o->model, ""))
                models.emplace_back(in.hole, buildHoleModel(in, o->model));
            for (double age : ages)
                for (const auto& [hole, m] : models) {
                    const IsochronDepth d = isochronDepth(m, age);
                    auto cell = [&](const std::optional<double>& v) {
                        return v ? formatNumber(*v, csv, 2) : std::string();
                    };
                    t.addRow({formatNumber(age, csv, 4), hole, cell(d.depth_q025_m),
                              cell(d.depth_q500_m), cell(d.depth_q975_m),
                              d.outside_model ? "outside the model"
                              : d.in_hiatus   ? "in a hiatus"
                                              : ""});
                }
            t.print(io.out, csv);
        }
        if (!o->events.empty()) {
            if (!o->ages.empty() && !csv) io.out << '\n';
            CorrelationOptions co;
            co.biostrat = o->model.biostrat;
            co.dates = o->model.dates;
            const CorrelationData c = gatherCorrelationData(data, co);
            TablePrinter t({{"event"}, {"hole"}, {"shallow_m", A::Right}, {"deep_m", A::Right},
                            {"level_m", A::Right}});
            for (const std::string& id : o->events)
                for (const EventTie& tie : eventTieLine(c, eventIndex(c, id)))
                    t.addRow({id, c.holes[tie.hole], formatNumber(tie.shallow_m, csv, 2),
                              formatNumber(tie.deep_m, csv, 2), formatNumber(tie.level_m, csv, 2)});
            t.print(io.out, csv);
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
