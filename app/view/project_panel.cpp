#include "view/project_panel.hpp"

#include "cli/correlation_inputs.hpp"
#include "cli/panel_source.hpp"
#include "cli/stored_age_models.hpp"

#include "atollog/db/project_store.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <thread>

namespace atollog::view {

std::vector<double> isochronAges(double oldest_ma) {
    std::vector<double> ages;
    if (!(oldest_ma > 0.0) || !std::isfinite(oldest_ma)) {
        return ages;
    }
    const double decade = std::pow(10.0, std::floor(std::log10(oldest_ma / 10.0)));
    double step = decade;
    for (const double m : {1.0, 2.0, 5.0, 10.0}) {
        step = m * decade;
        if (oldest_ma / step <= 10.0) {
            break;
        }
    }
    for (int k = 1; k * step <= oldest_ma * (1 + 1e-9); ++k) {
        ages.push_back(k * step);
    }
    return ages;
}

namespace {

/// Evenly spread picks of at most `n` from `all`, so the first view is neither empty nor a
/// thicket of lines.
std::vector<std::string> spread(const std::vector<std::string> &all, std::size_t n) {
    if (all.size() <= n) {
        return all;
    }
    std::vector<std::string> out;
    for (std::size_t k = 0; k < n; ++k) {
        out.push_back(all[(2 * k + 1) * all.size() / (2 * n)]);
    }
    return out;
}

} // namespace

std::string modelSourceLine(const ProjectPanel &panel) {
    const auto joined = [](const std::vector<std::string> &parts) {
        std::string s;
        for (const std::string &p : parts) {
            s += (s.empty() ? "" : ", ") + p;
        }
        return s;
    };
    std::string line;
    if (!panel.model_sources.empty()) {
        line = "Age models stored in the project: " + joined(panel.model_sources) + ".";
    }
    if (!panel.holes_with_default_models.empty()) {
        line += (line.empty() ? "" : " ") + std::string("No fresh stored run, so built with default "
                                                        "settings where the data allow: ") +
                joined(panel.holes_with_default_models) + ".";
    }
    return line;
}

ProjectPanel loadProjectPanel(const std::filesystem::path &project) {
    auto store = db::ProjectStore::open(project);
    const CoreDataset data = store.loadDataset();

    cli::PanelSourceOptions options;
    // The age models the user ran and stored (with their own settings) when they are fresh;
    // the other holes' models are built with default settings.
    cli::StoredModelChoice stored = cli::latestStoredAgeModels(store, data);
    options.ready_models = std::move(stored.models);
    options.title = project.stem().string();
    // The models give the same bits on any thread count (DEVELOPERS.md), so use the machine.
    options.model.threads = static_cast<int>(std::max(1u, std::thread::hardware_concurrency()));

    // A tie needs two holes; events seen in one hole would only add labels.
    const CorrelationData correlation = cli::gatherCorrelationData(data, cli::CorrelationOptions{});
    std::map<std::size_t, std::size_t> holes_seen;
    for (const EventLevel &level : correlation.levels) {
        ++holes_seen[level.event];
    }
    std::vector<std::string> in_every_hole;
    for (std::size_t e = 0; e < correlation.events.size(); ++e) {
        if (holes_seen[e] >= 2) {
            options.events.push_back(correlation.events[e].id);
            if (holes_seen[e] == correlation.holes.size()) {
                in_every_hole.push_back(correlation.events[e].id);
            }
        }
    }

    double oldest_ma = 0.0;
    for (const TimeScaleEvent &event : data.events) {
        oldest_ma = std::max(oldest_ma, event.age_ma);
    }
    options.ages_ma = isochronAges(oldest_ma);
    // Every track's data, so the side pane only chooses: a lane for every taxon (none ticked at
    // first), zones of every scheme, dates, and the age models built for the isochrons anyway.
    for (const Taxon &taxon : data.taxa) {
        options.taxa.push_back(taxon.taxon);
    }
    options.zones = true;
    options.dates = true;
    options.age_model = true;

    ProjectPanel out;
    out.model_sources = std::move(stored.sources);
    for (const Hole &h : data.holes) {
        if (options.ready_models.count(h.hole) == 0) {
            out.holes_with_default_models.push_back(h.hole);
        }
    }
    out.full = cli::panelInputFromDataset(data, options);
    out.default_events = spread(in_every_hole.empty() ? options.events : in_every_hole, 5);
    std::vector<std::string> labels;
    for (const auto &iso : out.full.isochrons) {
        if (iso.at.size() >= 2) {
            labels.push_back(iso.label);
        }
    }
    out.default_isochrons = spread(labels, 2);
    return out;
}

} // namespace atollog::view
