#include "draw/fill_pattern_painter.hpp"

#include <QPainter>
#include <QPainterPath>
#include <QPen>

#include <cmath>

namespace atollog::draw {

namespace {

constexpr double kPatternLine_mm = 0.15;

// FGDC-STD-013-2006 pattern 627 (limestone) is a brick bond: courses of horizontal lines with
// vertical joints offset by half a brick in alternate courses.
constexpr double kBrickCourse_mm = 2.0;
constexpr double kBrickLength_mm = 4.0;

// atollog's own reef-framework pattern: staggered rows of small domes (open upward arcs),
// because the standard has none for reef rock.
constexpr double kDomeRow_mm = 2.5;
constexpr double kDomePitch_mm = 3.0;
constexpr double kDomeRadius_mm = 0.8;

double firstMultipleAtOrBefore(double v, double step) {
    return std::floor(v / step) * step;
}

void paintBricks(QPainter &p, const RectMm &box) {
    QPainterPath path;
    const double y0 = firstMultipleAtOrBefore(box.top_mm, kBrickCourse_mm);
    for (double y = y0; y <= box.bottom_mm(); y += kBrickCourse_mm) {
        path.moveTo(box.left_mm, y);
        path.lineTo(box.right_mm(), y);
        const auto course = static_cast<long long>(std::llround(y / kBrickCourse_mm));
        const double shift = (course % 2 == 0) ? 0.0 : kBrickLength_mm / 2;
        const double x0 = firstMultipleAtOrBefore(box.left_mm - shift, kBrickLength_mm) + shift;
        for (double x = x0; x <= box.right_mm(); x += kBrickLength_mm) {
            path.moveTo(x, y);
            path.lineTo(x, y + kBrickCourse_mm);
        }
    }
    p.drawPath(path);
}

void paintDomes(QPainter &p, const RectMm &box) {
    QPainterPath path;
    const double y0 = firstMultipleAtOrBefore(box.top_mm, kDomeRow_mm);
    for (double y = y0; y <= box.bottom_mm() + kDomeRow_mm; y += kDomeRow_mm) {
        const auto row = static_cast<long long>(std::llround(y / kDomeRow_mm));
        const double shift = (row % 2 == 0) ? 0.0 : kDomePitch_mm / 2;
        const double x0 = firstMultipleAtOrBefore(box.left_mm - shift, kDomePitch_mm) + shift;
        for (double x = x0; x <= box.right_mm() + kDomePitch_mm; x += kDomePitch_mm) {
            const QRectF circle(x - kDomeRadius_mm, y - kDomeRadius_mm, 2 * kDomeRadius_mm,
                                2 * kDomeRadius_mm);
            path.arcMoveTo(circle, 0.0);
            path.arcTo(circle, 0.0, 180.0); // upper half: a dome on the row line
        }
    }
    p.drawPath(path);
}

} // namespace

void paintFillPattern(QPainter &p, FillPattern pattern, const RectMm &box) {
    if (pattern == FillPattern::None) {
        return;
    }
    p.save();
    p.setClipRect(QRectF(box.left_mm, box.top_mm, box.width_mm, box.height_mm), Qt::IntersectClip);
    QPen pen(Qt::black);
    pen.setWidthF(kPatternLine_mm);
    pen.setCapStyle(Qt::FlatCap);
    p.setPen(pen);
    p.setBrush(Qt::NoBrush);
    switch (pattern) {
    case FillPattern::Limestone:
        paintBricks(p, box);
        break;
    case FillPattern::ReefFramework:
        paintDomes(p, box);
        break;
    case FillPattern::None:
        break;
    }
    p.restore();
}

} // namespace atollog::draw
