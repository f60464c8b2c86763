#pragma once
// The core runs of the chosen hole, one per line, in stored order: run id, top, base and
// recovered length typed in the desk's depth unit, and the run's cored length and recovery
// (recovered / cored, in %) computed, read only, so the recovery follows what is typed.
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class RunsTableModel : public DeskRows<CoreRun> {
    Q_OBJECT

  public:
    enum Column { Run, Top, Base, Recovered, Cored, Recovery, ColumnCount };

    explicit RunsTableModel(DeskProject &desk, QObject *parent = nullptr);


    const CoreRun &runAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int column) const override { return column < Cored; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// The next run: from the base of the hole's deepest run, as long as that run (the barrel
    /// is usually the same), nothing recovered yet, its id counted on from that run's.
    TypedRow newRow() const override;
    int firstNewRowColumn() const override { return Base; }
};

/// Length of a hole's first run when there is no run to take it from: our first guess, typed over.
inline constexpr double kFirstRunLength_m = 1.0;

/// Recovered over cored length in %, as shown (one decimal); empty for a run without length.
QString recoveryText(const CoreRun &run);

} // namespace atollog::view
