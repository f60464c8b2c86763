#include "view/word_choice_delegate.hpp"

#include <QComboBox>

#include <algorithm>

namespace atollog::view {

QWidget *WordChoiceDelegate::createEditor(QWidget *parent, const QStyleOptionViewItem &option,
                                          const QModelIndex &index) const {
    const QVariant words = index.data(kWordChoicesRole);
    if (!words.isValid()) {
        return QStyledItemDelegate::createEditor(parent, option, index);
    }
    auto *combo = new QComboBox(parent);
    combo->addItems(words.toStringList());
    return combo;
}

void WordChoiceDelegate::setEditorData(QWidget *editor, const QModelIndex &index) const {
    if (auto *combo = qobject_cast<QComboBox *>(editor)) {
        const int at = combo->findText(index.data(Qt::EditRole).toString());
        if (at < 0) {
            // A word the list does not hold (stored before, or by another program): keep it
            // visible and chosen, so tabbing through writes nothing.
            combo->insertItem(0, index.data(Qt::EditRole).toString());
        }
        combo->setCurrentIndex(std::max(0, at));
        return;
    }
    QStyledItemDelegate::setEditorData(editor, index);
}

void WordChoiceDelegate::setModelData(QWidget *editor, QAbstractItemModel *model,
                                      const QModelIndex &index) const {
    if (auto *combo = qobject_cast<QComboBox *>(editor)) {
        model->setData(index, combo->currentText(), Qt::EditRole);
        return;
    }
    QStyledItemDelegate::setModelData(editor, model, index);
}

} // namespace atollog::view
