#pragma once
// The widget that shows a laid-out panel: zoom about the cursor, pan by dragging, tooltips and
// selection from the display list's tags, and columns reordered by dragging their headers. It
// paints through the drawing layer (paintDisplayList), only the exposed part.
#include "draw/paint_display_list.hpp"
#include "view/panel_scene.hpp"
#include "view/view_transform.hpp"

#include <QList>
#include <QPixmap>
#include <QString>
#include <QWidget>

#include <cstddef>
#include <optional>

namespace atollog::view {

class PanelCanvas : public QWidget {
    Q_OBJECT

  public:
    explicit PanelCanvas(QWidget *parent = nullptr);

    /// Shows a new scene, keeping the view transform (a relayout should not jump) and the
    /// selected datum when the new scene still draws it (else itemSelected(None, "")).
    void setScene(PanelScene scene);
    const PanelScene &scene() const { return scene_; }

    const ViewTransform &transform() const { return transform_; }
    void setTransform(const ViewTransform &t);

    /// The whole page in the widget with a small margin.
    void fitToWindow();
    /// One wheel notch either way, about the widget centre.
    void zoomIn();
    void zoomOut();

    /// The tooltip for a widget position: the item under it, then the axis readout.
    QString toolTipAt(const QPointF &widget_px) const;
    std::optional<std::size_t> selectedItem() const { return selected_; }
    const draw::DisplayList &highlightList() const { return highlight_; }
    /// Counts of the last paint (tests check that painting culls).
    draw::PaintStats lastPaintStats() const { return last_stats_; }

    static constexpr double kWheelStep = 1.25; ///< scale factor of one wheel notch (120 units)
    static constexpr double kHitTolerancePx = 4.0;

  signals:
    void itemSelected(atollog::draw::ItemRole role, const QString &key);
    /// After a header drag: the new left-to-right order as indices into the current columns.
    void columnOrderChanged(const QList<int> &order);
    /// The readout under the cursor, for a status bar.
    void cursorReadout(const QString &text);
    void transformChanged();

  protected:
    void paintEvent(QPaintEvent *event) override;
    void wheelEvent(QWheelEvent *event) override;
    void mousePressEvent(QMouseEvent *event) override;
    void mouseMoveEvent(QMouseEvent *event) override;
    void mouseReleaseEvent(QMouseEvent *event) override;
    bool event(QEvent *event) override;

  private:
    enum class Drag { None, Pan, Column };

    std::optional<std::size_t> itemAt(const QPointF &widget_px) const;
    std::optional<std::size_t> headerAt(const QPointF &widget_px) const;
    QPixmap renderColumnGhost(std::size_t column) const;
    void selectAt(const QPointF &widget_px);

    PanelScene scene_;
    ViewTransform transform_;
    std::optional<std::size_t> selected_;
    draw::ItemTag selected_tag_;  ///< the selected item's datum, to find it after a relayout
    draw::DisplayList highlight_; ///< the selected datum's items, recoloured (selection_highlight)
    draw::PaintStats last_stats_;

    Drag drag_ = Drag::None;
    bool drag_started_ = false;
    QPointF press_px_;
    QPointF last_px_;
    std::size_t drag_column_ = 0;
    QPixmap column_ghost_;
};

} // namespace atollog::view
