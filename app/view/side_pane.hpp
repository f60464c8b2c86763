#pragma once
// The side dock's content: details of the selected item, check lists of the events (tie lines)
// and ages (isochrons) to show, and the hole order. It holds the user's PanelChoice; the main
// window relayouts on choiceChanged.
#include "view/panel_choice.hpp"

#include <QWidget>

#include <string>
#include <vector>

class QGroupBox;
class QLabel;
class QListWidget;
class QListWidgetItem;

namespace atollog::view {

class SidePane : public QWidget {
    Q_OBJECT

  public:
    explicit SidePane(QWidget *parent = nullptr);

    /// Fills the lists from a project's full panel, ticked and ordered as `choice` says.
    void setContent(const draw::PanelInput &full, const PanelChoice &choice);
    PanelChoice choice() const;
    void setHoleOrder(const std::vector<std::string> &holes);
    void setDetails(const QString &text);
    QString details() const;

    QListWidget *eventList() const { return events_; }
    QListWidget *isochronList() const { return isochrons_; }
    QListWidget *holeList() const { return holes_; }

  signals:
    void choiceChanged();

  private:
    void moveSelectedHole(int step);
    void updateCounts();

    QLabel *details_ = nullptr;
    QListWidget *events_ = nullptr;
    QListWidget *isochrons_ = nullptr;
    QListWidget *holes_ = nullptr;
    QGroupBox *events_box_ = nullptr;
    QGroupBox *isochrons_box_ = nullptr;
    bool filling_ = false; ///< no choiceChanged while the lists are being filled
};

} // namespace atollog::view
