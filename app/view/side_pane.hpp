#pragma once
// The side dock's content: details of the selected item, check lists of the events (tie lines)
// and ages (isochrons) to show, and the hole order. It holds the user's PanelChoice; the main
// window relayouts on choiceChanged.
#include "draw/hole_column_input.hpp"
#include "view/panel_choice.hpp"

#include <QWidget>

#include <set>
#include <string>
#include <vector>

class QCheckBox;
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

    /// The column tracks ticked, and the taxa whose lanes are shown (ids).
    draw::HoleColumnTracks tracks() const;
    void setTracks(const draw::HoleColumnTracks &tracks);
    std::set<std::string> shownTaxa() const;

    QListWidget *eventList() const { return events_; }
    QListWidget *taxonList() const { return taxa_; }
    /// The track check box of a --tracks word (runs, lithology, ..., model); null for others.
    QCheckBox *trackBox(const QString &word) const;
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
    QListWidget *taxa_ = nullptr; ///< item data: the taxon id; text: its name
    std::vector<std::pair<QString, QCheckBox *>> track_boxes_;
    QGroupBox *events_box_ = nullptr;
    QGroupBox *isochrons_box_ = nullptr;
    bool filling_ = false; ///< no choiceChanged while the lists are being filled
};

} // namespace atollog::view
