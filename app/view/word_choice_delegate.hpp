#pragma once
// Cells whose value is a word of a closed vocabulary (rock, texture, binding, surface,
// mud-supported) are edited with a drop-down list of the allowed words, so a logger picks
// rather than spells; typing a first letter jumps to a word, Tab commits and moves on. The
// model offers the words through kWordChoicesRole; other cells get the usual line edit.
#include <QStyledItemDelegate>

namespace atollog::view {

/// The allowed words of a cell (QStringList, "" first when the field may be left empty), or
/// an invalid QVariant for a free cell.
inline constexpr int kWordChoicesRole = Qt::UserRole + 2;

class WordChoiceDelegate : public QStyledItemDelegate {
    Q_OBJECT

  public:
    using QStyledItemDelegate::QStyledItemDelegate;

    QWidget *createEditor(QWidget *parent, const QStyleOptionViewItem &option,
                          const QModelIndex &index) const override;
    void setEditorData(QWidget *editor, const QModelIndex &index) const override;
    void setModelData(QWidget *editor, QAbstractItemModel *model,
                      const QModelIndex &index) const override;
};

} // namespace atollog::view
