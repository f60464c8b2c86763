// `order`: the event-order graph of all holes: which events lie wholly below which, the
// contradictions between holes (cycles), and a first composite order.
#include "cli/command.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/event_order_graph.hpp"

#include <filesystem>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {

namespace {

std::string joined(const std::vector<std::size_t>& items,
                   const std::vector<std::string>& names, const char* sep) {
    std::string s;
    for (std::size_t i : items)
        s += (s.empty() ? "" : sep) + names[i];
    return s;
}

} // namespace

CommandRun addOrderCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string by = "conflict";
        bool csv = false;
        CorrelationOptions correlation;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "order", "Event-order graph of all holes: an edge where one event lies wholly below "
                 "another in a hole; contradictions between holes as cycles naming the holes and "
                 "events to recheck; a first composite order.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--by", o->by,
                    "conflict: each contradiction (a cycle); edge: every ordered pair with the "
                    "holes that order it; order: the first composite, oldest first")
        ->check(CLI::IsMember({"conflict", "edge", "order"}))
        ->capture_default_str();
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    addCorrelationOptions(*sub, o->correlation);
    return [o, &io]() {
        const auto store = db::ProjectStore::open(o->project);
        io.progress("picking events");
        const CorrelationData data = gatherCorrelationData(store.loadDataset(), o->correlation);
        io.progress("building the event-order graph");
        const EventOrderGraph g = buildEventOrderGraph(data);
        std::vector<std::string> events;
        for (const auto& e : data.events) events.push_back(e.id);
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        if (o->by == "edge") {
            TablePrinter t({{"older"}, {"younger"}, {"holes"}, {"separations_m"}, {"rule"}});
            for (const OrderEdge& e : g.edges) {
                std::string seps;
                for (double s : e.separations_m)
                    seps += (seps.empty() ? "" : ";") + formatNumber(s, csv, 2);
                t.addRow({events[e.older], events[e.younger], joined(e.holes, data.holes, ";"), seps,
                          e.rule});
            }
            t.print(io.out, csv);
        } else if (o->by == "order") {
            TablePrinter t({{"rank", A::Right}, {"event"}, {"kind"}, {"taxon"},
                            {"component", A::Right}, {"age_ma", A::Right}});
            int rank = 0;
            for (std::size_t e : g.first_composite) {
                const SequenceEvent& ev = data.events[e];
                t.addRow({std::to_string(++rank), ev.id, kindWord(ev.kind), ev.taxon,
                          std::to_string(g.component[e]),
                          ev.age_ma ? formatNumber(*ev.age_ma, csv, 3) : ""});
            }
            t.print(io.out, csv);
        } else {
            TablePrinter t({{"conflict", A::Right}, {"events"}, {"holes"}, {"what"}});
            int n = 0;
            for (const OrderConflict& c : g.conflicts)
                t.addRow({std::to_string(++n), joined(c.cycle, events, " > "),
                          joined(c.holes, data.holes, ";"), c.message});
            t.print(io.out, csv);
            if (!csv)
                io.out << g.conflicts.size() << " contradiction(s) among " << data.events.size()
                       << " events in " << data.holes.size() << " holes, " << g.edges.size()
                       << " ordered pairs\n";
        }
        return int(kOk);
    };
}

} // namespace atollog::cli
