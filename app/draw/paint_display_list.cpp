#include "draw/paint_display_list.hpp"

#include "draw/bundled_font.hpp"
#include "draw/dash_pattern.hpp"
#include "draw/fill_pattern_tile_brush.hpp"
#include "draw/strokes_as_fills.hpp"
#include "draw/text_extent.hpp"

#include <QFont>
#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
#include <QPen>
#include <QPolygonF>

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

// Text is shaped at a fixed pixel size and scaled to its point size by the painter transform:
// QFont::setPointSizeF would go through each device's logical DPI (96 for QImage, 72 for
// QSvgGenerator by default, 1200 for our PDFs) and come out at a different size on each.
constexpr int kReferenceFontPx = 100;

QColor toQColor(const Colour &c) {
    return QColor(c.r, c.g, c.b, c.a);
}

/// Always a solid pen: dashes are cut as geometry (see splitIntoDashes for why).
QPen toQPen(const Stroke &s) {
    QPen pen(toQColor(s.colour));
    pen.setWidthF(s.width_mm);
    pen.setJoinStyle(Qt::MiterJoin);
    pen.setCapStyle(s.dash == DashStyle::Solid ? Qt::SquareCap : Qt::FlatCap);
    return pen;
}

QPointF toQPoint(const PointMm &p) {
    return QPointF(p.x_mm, p.y_mm);
}

void strokePolyline(QPainter &p, const std::vector<PointMm> &points, const Stroke &stroke) {
    p.setPen(toQPen(stroke));
    p.setBrush(Qt::NoBrush);
    const auto draw = [&p](const std::vector<PointMm> &pts) {
        QPolygonF poly;
        for (const PointMm &pt : pts) {
            poly << toQPoint(pt);
        }
        p.drawPolyline(poly);
    };
    if (stroke.dash == DashStyle::Solid) {
        draw(points);
        return;
    }
    for (const std::vector<PointMm> &dash : splitIntoDashes(points, dashLengths(stroke.dash))) {
        draw(dash);
    }
}

/// The colour of a stroke drawn as a fill (see StrokesAsFills).
QColor fillColour(const Colour &c, double opacity) {
    return QColor(c.r, c.g, c.b, static_cast<int>(std::lround(c.a * opacity)));
}

void paintRect(QPainter &p, const Rect &r, FillPatternTileBrushes &patterns,
               const StrokesAsFills &strokes_as_fills) {
    const QRectF box(r.box.left_mm, r.box.top_mm, r.box.width_mm, r.box.height_mm);
    if (r.fill) {
        p.fillRect(box, toQColor(*r.fill));
    }
    patterns.paint(p, r.pattern, r.box);
    if (const auto outline = strokes_as_fills.boxOutline(r)) {
        QPainterPath ring;
        ring.setFillRule(Qt::OddEvenFill);
        ring.addRect(outline->outer);
        if (!outline->inner.isEmpty()) {
            ring.addRect(outline->inner);
        }
        p.fillPath(ring, fillColour(r.stroke->colour, outline->opacity));
    } else if (r.stroke && r.stroke->dash == DashStyle::Solid) {
        p.setPen(toQPen(*r.stroke));
        p.setBrush(Qt::NoBrush);
        p.drawRect(box);
    } else if (r.stroke) {
        const RectMm &b = r.box;
        strokePolyline(p,
                       {{b.left_mm, b.top_mm},
                        {b.right_mm(), b.top_mm},
                        {b.right_mm(), b.bottom_mm()},
                        {b.left_mm, b.bottom_mm()},
                        {b.left_mm, b.top_mm}},
                       *r.stroke);
    }
}

void paintLine(QPainter &p, const Line &l, const StrokesAsFills &strokes_as_fills) {
    if (const auto covered = strokes_as_fills.line(l)) {
        p.fillRect(covered->outer, fillColour(l.stroke.colour, covered->opacity));
        return;
    }
    strokePolyline(p, {l.from, l.to}, l.stroke);
}

void paintPolyline(QPainter &p, const Polyline &l) {
    strokePolyline(p, l.points, l.stroke);
}

void paintPolygon(QPainter &p, const Polygon &g) {
    QPolygonF poly;
    for (const PointMm &pt : g.points) {
        poly << toQPoint(pt);
    }
    p.setPen(Qt::NoPen);
    p.setBrush(toQColor(g.fill));
    p.drawPolygon(poly, Qt::OddEvenFill);
    if (g.stroke && !g.points.empty()) {
        std::vector<PointMm> closed = g.points;
        closed.push_back(g.points.front());
        strokePolyline(p, closed, *g.stroke);
    }
}

QPainterPath markerPath(const Marker &m) {
    const double h = m.size_mm / 2;
    const double x = m.centre_mm.x_mm, y = m.centre_mm.y_mm;
    QPainterPath path;
    switch (m.shape) {
    case MarkerShape::Circle:
        path.addEllipse(QPointF(x, y), h, h);
        break;
    case MarkerShape::Square:
        path.addRect(QRectF(x - h, y - h, m.size_mm, m.size_mm));
        break;
    case MarkerShape::Diamond:
        path.addPolygon(QPolygonF{{QPointF(x, y - h), QPointF(x + h, y), QPointF(x, y + h),
                                   QPointF(x - h, y), QPointF(x, y - h)}});
        break;
    case MarkerShape::TriangleUp:
        path.addPolygon(QPolygonF{
            {QPointF(x, y - h), QPointF(x + h, y + h), QPointF(x - h, y + h), QPointF(x, y - h)}});
        break;
    case MarkerShape::TriangleDown:
        path.addPolygon(QPolygonF{{QPointF(x - h, y - h), QPointF(x + h, y - h), QPointF(x, y + h),
                                   QPointF(x - h, y - h)}});
        break;
    case MarkerShape::HorizontalBar:
        path.addRect(QRectF(x - h, y - h / 3, m.size_mm, m.size_mm / 3));
        break;
    case MarkerShape::Tick:
        path.moveTo(x - h, y);
        path.lineTo(x + h, y);
        break;
    }
    return path;
}

void paintMarker(QPainter &p, const Marker &m) {
    const QColor colour = toQColor(m.colour);
    QPen pen(m.hollow ? colour : colour.darker(200)); // a darker rim keeps pale fills visible
    pen.setWidthF(m.stroke_mm);
    pen.setJoinStyle(Qt::MiterJoin);
    p.setPen(pen);
    if (m.shape == MarkerShape::Tick) {
        p.setBrush(Qt::NoBrush);
    } else {
        p.setBrush(m.hollow ? QColor(Qt::white) : colour);
    }
    p.drawPath(markerPath(m));
}

void paintText(QPainter &p, const Text &t, const QString &family) {
    QFont font(family);
    font.setPixelSize(kReferenceFontPx);
    font.setWeight(t.weight == FontWeight::Bold ? QFont::Bold : QFont::Normal);
    // Unhinted outlines scale linearly, so the text has the same proportions at every dpi.
    font.setHintingPreference(QFont::PreferNoHinting);
    const QString text = QString::fromUtf8(t.text.data(), static_cast<qsizetype>(t.text.size()));
    const QFontMetricsF metrics(font);
    const double width = metrics.horizontalAdvance(text);
    double x = 0.0;
    if (t.anchor == TextAnchor::Middle) {
        x = -width / 2;
    } else if (t.anchor == TextAnchor::End) {
        x = -width;
    }
    // Put the middle of the line box (ascent above, descent below the baseline) on the anchor.
    const double baseline_y = (metrics.ascent() - metrics.descent()) / 2;

    p.save();
    p.translate(toQPoint(t.anchor_mm));
    p.rotate(t.rotation_deg);
    const double scale = t.size_pt * kMmPerPoint / kReferenceFontPx;
    p.scale(scale, scale);
    p.setFont(font);
    p.setPen(toQColor(t.colour));
    p.drawText(QPointF(x, baseline_y), text);
    p.restore();
}

/// itemBounds(item).intersects(visible), without itemBounds' allocation for the two kinds of
/// item a panel is mostly made of (it about halved the time to cull 156,000 items).
/// The boxes are built exactly as itemBounds builds them, so the same items are culled.
bool mayShow(const DisplayItem &item, const RectMm &visible) {
    if (const Rect *r = std::get_if<Rect>(&item)) {
        return (r->stroke ? r->box.grown(r->stroke->width_mm / 2) : r->box).intersects(visible);
    }
    if (const Line *l = std::get_if<Line>(&item)) {
        const double left = std::min(l->from.x_mm, l->to.x_mm);
        const double right = std::max(l->from.x_mm, l->to.x_mm);
        const double top = std::min(l->from.y_mm, l->to.y_mm);
        const double bottom = std::max(l->from.y_mm, l->to.y_mm);
        return RectMm{left, top, right - left, bottom - top}
            .grown(l->stroke.width_mm / 2)
            .intersects(visible);
    }
    return itemBounds(item).intersects(visible);
}

} // namespace

PaintStats paintDisplayList(QPainter &painter, const DisplayList &list, const RectMm &visible_mm,
                            double px_per_mm, const PaintOptions &options) {
    if (!std::isfinite(px_per_mm) || px_per_mm <= 0.0) {
        throw std::invalid_argument("paintDisplayList: px_per_mm must be positive, got " +
                                    std::to_string(px_per_mm));
    }
    const QString family = bundledFontFamily();
    PaintStats stats;
    painter.save();
    painter.setRenderHint(QPainter::Antialiasing, true);
    painter.setRenderHint(QPainter::TextAntialiasing, true);
    painter.scale(px_per_mm, px_per_mm);
    painter.translate(-visible_mm.left_mm, -visible_mm.top_mm);
    FillPatternTileBrushes patterns(painter, options.patterns == PatternRendering::Automatic);
    const StrokesAsFills strokes_as_fills(painter, options.strokes_as_fills);
    for (const DisplayItem &item : list.items()) {
        if (!mayShow(item, visible_mm)) {
            ++stats.culled;
            continue;
        }
        // No save/restore per item: every painter below sets the pen and brush it uses, and
        // text and patterns keep their own transform and clip; the pair cost a fifth of a
        // large panel's painting.
        std::visit(
            [&](const auto &i) {
                using T = std::decay_t<decltype(i)>;
                if constexpr (std::is_same_v<T, Rect>) {
                    paintRect(painter, i, patterns, strokes_as_fills);
                } else if constexpr (std::is_same_v<T, Line>) {
                    paintLine(painter, i, strokes_as_fills);
                } else if constexpr (std::is_same_v<T, Polyline>) {
                    paintPolyline(painter, i);
                } else if constexpr (std::is_same_v<T, Polygon>) {
                    paintPolygon(painter, i);
                } else if constexpr (std::is_same_v<T, Text>) {
                    paintText(painter, i, family);
                } else {
                    paintMarker(painter, i);
                }
            },
            item);
        ++stats.painted;
    }
    painter.restore();
    return stats;
}

} // namespace atollog::draw
