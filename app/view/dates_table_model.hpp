#pragma once
// The numerical dates of the chosen hole, in stored order: where (a sample of the hole, or a
// depth in the desk's unit), the method, an entered age with its sd (Ma), and the raw
// measurements: U-Th activity ratios as one cell "230Th/238U ± sd; 234U/238U ± sd" (the four
// values a measurement needs, so it is typed in one go and never half there), the optional
// 232Th and 238U concentrations (ppb), F14C ± sd, and the reservoir offset ΔR ± sd (years).
// Measured values are shown at full precision. Clearing a measurement cell removes it.
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class DatesTableModel : public DeskRows<NumericalDate> {
    Q_OBJECT

  public:
    enum Column {
        SampleId, Depth, Method, Age, AgeSd, UThRatios, Th232, U238, F14C, DeltaR, ColumnCount
    };

    explicit DatesTableModel(DeskProject &desk, QObject *parent = nullptr);

    /// The method column offers the method words (kWordChoicesRole), the sample column the
    /// hole's samples.
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

    const NumericalDate &dateAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// A copy of the hole's last date, to be typed over (a date needs an age or a measurement
    /// from the start, and the desk does not invent one).
    TypedRow newRow() const override;
};

} // namespace atollog::view
