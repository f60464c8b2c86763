#include "view/panel_canvas.hpp"

#include "view/axis_readout.hpp"
#include "view/column_reorder.hpp"
#include "view/hit_test.hpp"
#include "view/item_description.hpp"
#include "view/selection_highlight.hpp"

#include <QApplication>
#include <QHelpEvent>
#include <QMouseEvent>
#include <QPaintEvent>
#include <QPainter>
#include <QToolTip>
#include <QWheelEvent>

#include <algorithm>
#include <cmath>

namespace atollog::view {

namespace {

constexpr double kFitMarginPx = 12.0;
const QColor kDesk(0x9a, 0x9a, 0x9a); // around the page, so the paper's edge shows
const QColor kDropMark(0x00, 0x72, 0xB2);

} // namespace

PanelCanvas::PanelCanvas(QWidget *parent) : QWidget(parent) {
    setMouseTracking(true); // the status-bar readout follows the cursor without a button down
    setAttribute(Qt::WA_OpaquePaintEvent); // every paint covers its whole exposed rectangle
    setFocusPolicy(Qt::WheelFocus);
    setMinimumSize(200, 150);
}

void PanelCanvas::setScene(PanelScene scene) {
    scene_ = std::move(scene);
    // Item indices change with every layout: find the selected datum again by its tag.
    const std::optional<draw::ItemTag> was =
        selected_ ? std::optional<draw::ItemTag>(selected_tag_) : std::nullopt;
    selected_.reset();
    highlight_ = draw::DisplayList();
    if (was) {
        const auto &items = scene_.list.items();
        for (std::size_t i = 0; i < items.size(); ++i) {
            const draw::ItemTag &tag = draw::itemTag(items[i]);
            if (tag.role == was->role && tag.key == was->key) {
                selected_ = i;
                highlight_ = selectionHighlight(scene_.list, tag);
                break;
            }
        }
        if (!selected_) {
            emit itemSelected(draw::ItemRole::None, QString()); // it is no longer shown
        }
    }
    update();
}

void PanelCanvas::setTransform(const ViewTransform &t) {
    transform_ = t;
    update();
    emit transformChanged();
}

void PanelCanvas::fitToWindow() {
    transform_.fit(scene_.list.page(), QSizeF(size()), kFitMarginPx);
    update();
    emit transformChanged();
}

void PanelCanvas::zoomIn() {
    transform_.zoomAbout(QRectF(rect()).center(), kWheelStep);
    update();
    emit transformChanged();
}

void PanelCanvas::zoomOut() {
    transform_.zoomAbout(QRectF(rect()).center(), 1.0 / kWheelStep);
    update();
    emit transformChanged();
}

std::optional<std::size_t> PanelCanvas::itemAt(const QPointF &widget_px) const {
    return hitTest(scene_.list, transform_.toScene(widget_px),
                   kHitTolerancePx / transform_.pxPerMm());
}

std::optional<std::size_t> PanelCanvas::headerAt(const QPointF &widget_px) const {
    const draw::PointMm at = transform_.toScene(widget_px);
    const auto column = columnAt(scene_, at);
    if (column && at.y_mm < columnBodyTop_mm(scene_.geometry, *column)) {
        return column;
    }
    return std::nullopt;
}

QString PanelCanvas::toolTipAt(const QPointF &widget_px) const {
    QStringList lines;
    if (const auto hit = itemAt(widget_px)) {
        const draw::ItemTag &tag = draw::itemTag(scene_.list.items()[*hit]);
        // A data-track item in words with its data in the column under the cursor.
        const draw::PointMm at = transform_.toScene(widget_px);
        const auto column = columnAt(scene_, at);
        std::optional<double> depth;
        if (column && *column < scene_.geometry.column_offset_m.size()) {
            depth = draw::panelDepth_m(scene_.geometry, *column, at.y_mm);
        }
        const QString track = describeTrackItem(scene_.input, tag, column, depth);
        lines << (track.isEmpty() ? describeItem(tag) : track);
    }
    const QString readout = axisReadout(scene_, transform_.toScene(widget_px));
    if (!readout.isEmpty()) {
        lines << readout;
    }
    return lines.join(QLatin1Char('\n'));
}

void PanelCanvas::paintEvent(QPaintEvent *event) {
    QPainter painter(this);
    const QRectF page = transform_.toWidget(scene_.list.page());
    for (const QRect &exposed : event->region()) {
        painter.fillRect(exposed, kDesk);
        painter.fillRect(page.intersected(QRectF(exposed)), Qt::white);
        painter.save();
        painter.setClipRect(exposed);
        // paintDisplayList puts the visible area's top-left at the painter's origin.
        painter.translate(exposed.topLeft());
        last_stats_ = draw::paintDisplayList(
            painter, scene_.list, transform_.toScene(QRectF(exposed)), transform_.pxPerMm());
        painter.restore();
    }
    if (!highlight_.items().empty()) {
        painter.save();
        painter.setClipRect(event->rect());
        painter.translate(event->rect().topLeft());
        draw::paintDisplayList(painter, highlight_, transform_.toScene(QRectF(event->rect())),
                               transform_.pxPerMm());
        painter.restore();
    }
    if (drag_ == Drag::Column && drag_started_ && !column_ghost_.isNull()) {
        const draw::RectMm &box = scene_.geometry.column_boxes[drag_column_];
        const QRectF from = transform_.toWidget(box);
        const double shift = last_px_.x() - press_px_.x();
        painter.setOpacity(0.6);
        painter.drawPixmap(from.topLeft() + QPointF(shift, 0), column_ghost_);
        painter.setOpacity(1.0);
        // Where the column will land: a bar left of the column it will stand before.
        const auto order = reorderedColumns(scene_.geometry.column_boxes, drag_column_,
                                            shift / transform_.pxPerMm());
        const auto pos = std::find(order.begin(), order.end(), drag_column_) - order.begin();
        const auto &boxes = scene_.geometry.column_boxes;
        double x_mm = 0;
        if (static_cast<std::size_t>(pos) + 1 < order.size()) {
            x_mm = boxes[order[static_cast<std::size_t>(pos) + 1]].left_mm - 2.0;
        } else {
            x_mm = boxes[order[static_cast<std::size_t>(pos) - (pos > 0 ? 1 : 0)]].right_mm() + 2.0;
        }
        const double x = transform_.toWidget(draw::PointMm{x_mm, 0}).x();
        painter.setPen(QPen(kDropMark, 3.0));
        painter.drawLine(QPointF(x, from.top()), QPointF(x, from.bottom()));
    }
}

QPixmap PanelCanvas::renderColumnGhost(std::size_t column) const {
    // Drawn once per drag at the screen's device pixel ratio, so the moving column stays sharp
    // on high-DPI screens and each mouse move costs one pixmap copy, not a repaint of the list.
    const draw::RectMm &box = scene_.geometry.column_boxes[column];
    const QRectF on_widget = transform_.toWidget(box);
    const double dpr = devicePixelRatioF();
    const QSize px(std::max(1, static_cast<int>(std::ceil(on_widget.width() * dpr))),
                   std::max(1, static_cast<int>(std::ceil(on_widget.height() * dpr))));
    if (px.width() > 8192 || px.height() > 8192) {
        return {}; // zoomed far in: the drop bar alone shows where the column goes
    }
    QPixmap ghost(px);
    ghost.setDevicePixelRatio(dpr);
    ghost.fill(QColor(255, 255, 255, 200));
    QPainter p(&ghost);
    draw::paintDisplayList(p, scene_.list, box, transform_.pxPerMm());
    return ghost;
}

void PanelCanvas::wheelEvent(QWheelEvent *event) {
    const double notches = event->angleDelta().y() / 120.0;
    if (notches == 0.0) {
        event->ignore();
        return;
    }
    transform_.zoomAbout(event->position(), std::pow(kWheelStep, notches));
    update();
    emit transformChanged();
    event->accept();
}

void PanelCanvas::mousePressEvent(QMouseEvent *event) {
    if (event->button() != Qt::LeftButton) {
        QWidget::mousePressEvent(event);
        return;
    }
    press_px_ = last_px_ = event->position();
    drag_started_ = false;
    if (const auto column = headerAt(event->position())) {
        drag_ = Drag::Column;
        drag_column_ = *column;
    } else {
        drag_ = Drag::Pan;
    }
    event->accept();
}

void PanelCanvas::mouseMoveEvent(QMouseEvent *event) {
    const QPointF pos = event->position();
    emit cursorReadout(
        axisReadout(scene_, transform_.toScene(pos)).replace('\n', QStringLiteral("; ")));
    if (drag_ == Drag::None) {
        return;
    }
    if (!drag_started_ && (pos - press_px_).manhattanLength() < QApplication::startDragDistance()) {
        return;
    }
    if (!drag_started_ && drag_ == Drag::Column) {
        column_ghost_ = renderColumnGhost(drag_column_);
        setCursor(Qt::SizeHorCursor);
    } else if (!drag_started_) {
        setCursor(Qt::ClosedHandCursor);
    }
    drag_started_ = true;
    if (drag_ == Drag::Pan) {
        transform_.panBy(pos - last_px_);
        emit transformChanged();
    }
    last_px_ = pos;
    update();
}

void PanelCanvas::mouseReleaseEvent(QMouseEvent *event) {
    if (event->button() != Qt::LeftButton || drag_ == Drag::None) {
        QWidget::mouseReleaseEvent(event);
        return;
    }
    const Drag was = drag_;
    drag_ = Drag::None;
    unsetCursor();
    column_ghost_ = QPixmap();
    if (!drag_started_) {
        selectAt(event->position());
    } else if (was == Drag::Column) {
        const double shift_mm = (event->position().x() - press_px_.x()) / transform_.pxPerMm();
        const auto order = reorderedColumns(scene_.geometry.column_boxes, drag_column_, shift_mm);
        QList<int> as_ints;
        bool moved = false;
        for (std::size_t i = 0; i < order.size(); ++i) {
            as_ints << static_cast<int>(order[i]);
            moved = moved || order[i] != i;
        }
        if (moved) {
            emit columnOrderChanged(as_ints);
        }
    }
    drag_started_ = false;
    update();
    event->accept();
}

void PanelCanvas::selectAt(const QPointF &widget_px) {
    selected_ = itemAt(widget_px);
    highlight_ = draw::DisplayList();
    update();
    if (selected_) {
        const draw::ItemTag &tag = draw::itemTag(scene_.list.items()[*selected_]);
        selected_tag_ = tag;
        highlight_ = selectionHighlight(scene_.list, tag);
        emit itemSelected(tag.role, QString::fromStdString(tag.key));
    } else {
        emit itemSelected(draw::ItemRole::None, QString());
    }
}

bool PanelCanvas::event(QEvent *event) {
    if (event->type() == QEvent::ToolTip) {
        auto *help = static_cast<QHelpEvent *>(event);
        const QString text = toolTipAt(QPointF(help->pos()));
        if (text.isEmpty()) {
            QToolTip::hideText();
            event->ignore();
        } else {
            QToolTip::showText(help->globalPos(), text, this);
        }
        return true;
    }
    return QWidget::event(event);
}

} // namespace atollog::view
