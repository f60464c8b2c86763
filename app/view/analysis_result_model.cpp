#include "view/analysis_result_model.hpp"

#include <QString>

#include <utility>

namespace atollog::view {
namespace {

/// The unit a column name carries, for its tooltip (the names are the command's).
QString unitOf(const std::string &name) {
    auto ends = [&](const std::string &suffix) {
        return name.size() > suffix.size() &&
               name.compare(name.size() - suffix.size(), suffix.size(), suffix) == 0;
    };
    if (ends("_m")) return QStringLiteral("in metres");
    if (ends("_ma")) return QStringLiteral("in Ma (millions of years)");
    return {};
}

} // namespace

AnalysisResultModel::AnalysisResultModel(QObject *parent) : QAbstractTableModel(parent) {}

void AnalysisResultModel::setTable(cli::TablePrinter table) {
    beginResetModel();
    table_ = std::move(table);
    endResetModel();
}

void AnalysisResultModel::clear() { setTable(cli::TablePrinter({})); }

int AnalysisResultModel::rowCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : static_cast<int>(table_.rowCount());
}

int AnalysisResultModel::columnCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : static_cast<int>(table_.columns().size());
}

QVariant AnalysisResultModel::data(const QModelIndex &index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return {};
    }
    const auto row = static_cast<std::size_t>(index.row());
    const auto column = static_cast<std::size_t>(index.column());
    switch (role) {
    case Qt::DisplayRole:
    case Qt::ToolTipRole:
        return QString::fromStdString(table_.rows()[row][column]);
    case Qt::TextAlignmentRole:
        return static_cast<int>(
            Qt::AlignVCenter |
            (table_.columns()[column].align == cli::TablePrinter::Align::Right ? Qt::AlignRight
                                                                                : Qt::AlignLeft));
    default:
        return {};
    }
}

QVariant AnalysisResultModel::headerData(int section, Qt::Orientation orientation,
                                         int role) const {
    if (orientation == Qt::Vertical) {
        return role == Qt::DisplayRole ? QVariant(section + 1) : QVariant();
    }
    if (section < 0 || section >= columnCount()) {
        return {};
    }
    const std::string &name = table_.columns()[static_cast<std::size_t>(section)].name;
    switch (role) {
    case Qt::DisplayRole:
        return QString::fromStdString(name);
    case Qt::ToolTipRole: {
        const QString unit = unitOf(name);
        return unit.isEmpty() ? QVariant() : QVariant(unit);
    }
    default:
        return {};
    }
}

} // namespace atollog::view
