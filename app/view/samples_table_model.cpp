#include "view/samples_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/next_id.hpp"

#include <algorithm>

namespace atollog::view {

namespace {

const char *const kFieldNames[] = {"sample", "top_m", "base_m", "kind"};

} // namespace

SamplesTableModel::SamplesTableModel(DeskProject &desk, QObject *parent)
    : DeskRows(desk, parent) {}

QString SamplesTableModel::columnTitle(int column) const {
    const QString unit = unitSymbol(depthUnit());
    switch (column) {
    case SampleId: return tr("Sample");
    case Top: return tr("Top (%1)").arg(unit);
    case Base: return tr("Base (%1)").arg(unit);
    case Kind: return tr("Kind");
    default: return {};
    }
}

QString SamplesTableModel::columnTip(int column) const {
    switch (column) {
    case Base: return tr("Equal to the top for a point sample");
    case Kind: return tr("A free word: core, cuttings, barren, ...");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QString SamplesTableModel::cellText(int r, int column) const {
    const Sample &s = sampleAt(r);
    switch (column) {
    case SampleId: return QString::fromStdString(s.sample);
    case Top: return depthText(s.top_m, depthUnit());
    case Base: return depthText(s.base_m, depthUnit());
    case Kind: return QString::fromStdString(s.kind);
    default: return {};
    }
}

DeskTableModel::TypedRow SamplesTableModel::typed(int r, int column, const QString &text) const {
    Sample s = sampleAt(r);
    switch (column) {
    case SampleId: s.sample = text.toStdString(); return db::EditableRow{s};
    case Kind: s.kind = text.toStdString(); return db::EditableRow{s};
    default: break;
    }
    const std::optional<double> number = readNumber(text);
    if (!number) {
        return tr("samples: sample '%1': %2: '%3' is not a number; type a depth in %4, e.g. 12.5")
            .arg(QString::fromStdString(s.sample), columnTitle(column),
                 text, unitSymbol(depthUnit()));
    }
    (column == Top ? s.top_m : s.base_m) = depthInMetres(*number, depthUnit());
    return db::EditableRow{s};
}

QString SamplesTableModel::editLabel(int r, int column) const {
    return tr("%1 of sample %2")
        .arg(QLatin1String(kFieldNames[column]), QString::fromStdString(sampleAt(r).sample));
}

QString SamplesTableModel::rowName(int r) const {
    return tr("sample %1").arg(QString::fromStdString(sampleAt(r).sample));
}

DeskTableModel::TypedRow SamplesTableModel::newRow() const {
    if (hole().empty()) {
        return tr("samples: no hole is chosen; choose the hole to add a sample to");
    }
    Sample s;
    s.hole = hole();
    std::vector<std::string> taken;
    for (const Sample &other : desk().data().samples) {
        taken.push_back(other.sample);
    }
    const auto deepest = std::max_element(rows_.begin(), rows_.end(),
                                          [](const Sample &a, const Sample &b) {
                                              return a.base_m < b.base_m;
                                          });
    if (deepest != rows_.end()) {
        s.top_m = s.base_m = deepest->base_m;
        s.kind = deepest->kind;
        s.sample = nextId(deepest->sample, taken);
        return db::EditableRow{s};
    }
    const CoreRun *first = nullptr;
    for (const CoreRun &r : desk().data().runs) {
        if (r.hole == hole() && (!first || r.top_m < first->top_m)) {
            first = &r;
        }
    }
    if (!first) {
        return tr("samples: hole '%1' has no core run, so a sample has no place yet; add the "
                  "hole's first run first")
            .arg(QString::fromStdString(hole()));
    }
    s.top_m = s.base_m = first->top_m;
    s.sample = nextId(hole() + "-000", taken);
    return db::EditableRow{s};
}

} // namespace atollog::view
