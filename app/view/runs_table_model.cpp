#include "view/runs_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/next_id.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::view {

namespace {

const char *const kFieldNames[] = {"run", "top_m", "base_m", "recovered_m", "cored_m",
                                   "recovery_pct"};

} // namespace

RunsTableModel::RunsTableModel(DeskProject &desk, QObject *parent) : DeskRows(desk, parent) {}

QString RunsTableModel::columnTitle(int column) const {
    const QString unit = unitSymbol(depthUnit());
    switch (column) {
    case Run: return tr("Run");
    case Top: return tr("Top (%1)").arg(unit);
    case Base: return tr("Base (%1)").arg(unit);
    case Recovered: return tr("Recovered (%1)").arg(unit);
    case Cored: return tr("Cored (%1)").arg(unit);
    case Recovery: return tr("Recovery (%)");
    default: return {};
    }
}

QString RunsTableModel::columnTip(int column) const {
    switch (column) {
    case Cored: return tr("Base minus top; computed");
    case Recovery: return tr("Recovered over cored length; computed, updated as you log");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QString recoveryText(const CoreRun &run) {
    const double cored_m = run.cored_m();
    if (!(cored_m > 0) || !std::isfinite(run.recovered_m)) {
        return {}; // no length, no share: the run's own check says what is wrong
    }
    return QString::number(100.0 * run.recovered_m / cored_m, 'f', 1);
}

QString RunsTableModel::cellText(int r, int column) const {
    const CoreRun &run = runAt(r);
    switch (column) {
    case Run: return QString::fromStdString(run.run);
    case Top: return depthText(run.top_m, depthUnit());
    case Base: return depthText(run.base_m, depthUnit());
    case Recovered: return depthText(run.recovered_m, depthUnit());
    case Cored: return depthText(run.cored_m(), depthUnit());
    case Recovery: return recoveryText(run);
    default: return {};
    }
}

DeskTableModel::TypedRow RunsTableModel::typed(int r, int column, const QString &text) const {
    CoreRun run = runAt(r);
    if (column == Run) {
        run.run = text.toStdString();
        return db::EditableRow{run};
    }
    const std::optional<double> number = readNumber(text);
    const QString field = columnTitle(column);
    if (!number) {
        return tr("runs: run '%1': %2: '%3' is not a number; type a length in %4, e.g. 1.25")
            .arg(QString::fromStdString(run.run), field, text, unitSymbol(depthUnit()));
    }
    const double metres = depthInMetres(*number, depthUnit());
    switch (column) {
    case Top: run.top_m = metres; break;
    case Base: run.base_m = metres; break;
    case Recovered: run.recovered_m = metres; break;
    default: return tr("%1 is computed, not typed").arg(field);
    }
    return db::EditableRow{run};
}

QString RunsTableModel::editLabel(int r, int column) const {
    return tr("%1 of run %2")
        .arg(QLatin1String(kFieldNames[column]), QString::fromStdString(runAt(r).run));
}

QString RunsTableModel::rowName(int r) const {
    return tr("run %1").arg(QString::fromStdString(runAt(r).run));
}

DeskTableModel::TypedRow RunsTableModel::newRow() const {
    if (hole().empty()) {
        return tr("runs: no hole is chosen; choose the hole to add a run to");
    }
    CoreRun run;
    run.hole = hole();
    const auto deepest = std::max_element(rows_.begin(), rows_.end(),
                                          [](const CoreRun &a, const CoreRun &b) {
                                              return a.base_m < b.base_m;
                                          });
    std::vector<std::string> taken;
    for (const CoreRun &r : desk().data().runs) {
        taken.push_back(r.run);
    }
    if (deepest == rows_.end()) {
        run.top_m = 0;
        run.base_m = kFirstRunLength_m;
        run.run = nextId(hole() + "-R00", taken);
    } else {
        const double length_m = deepest->cored_m() > 0 ? deepest->cored_m() : kFirstRunLength_m;
        run.top_m = deepest->base_m;
        // Rounded to the micrometre, as typed lengths are (36.8 + 1.08 is not 37.88 in binary).
        run.base_m = std::round((deepest->base_m + length_m) * 1e6) / 1e6;
        run.run = nextId(deepest->run, taken);
    }
    run.recovered_m = 0;
    return db::EditableRow{run};
}

} // namespace atollog::view
