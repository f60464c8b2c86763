#pragma once
// A read-only table model over an analysis result's table, as people read it (the aligned
// form's cells: numbers fixed, "open" bracket ends); numeric columns are right-aligned as in
// the command's aligned table, and the header tooltips say the units the names carry.
#include "cli/table_printer.hpp"

#include <QAbstractTableModel>

namespace atollog::view {

class AnalysisResultModel : public QAbstractTableModel {
    Q_OBJECT

  public:
    explicit AnalysisResultModel(QObject *parent = nullptr);

    /// Shows `table` (a reset); an empty table clears the view.
    void setTable(cli::TablePrinter table);
    void clear();

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation,
                        int role = Qt::DisplayRole) const override;

  private:
    cli::TablePrinter table_{std::vector<cli::TablePrinter::Column>{}};
};

} // namespace atollog::view
