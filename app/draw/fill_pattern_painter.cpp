#include "draw/fill_pattern_painter.hpp"

#include <QPainter>
#include <QPainterPath>
#include <QPen>

#include <cmath>

namespace atollog::draw {

namespace {

constexpr double kPatternLine_mm = 0.15;
constexpr double kSmallestPatternedBox_px = 3.0;

// FGDC-STD-013-2006 pattern 627 (limestone) is a brick bond: courses of horizontal lines with
// vertical joints offset by half a brick in alternate courses.
constexpr double kBrickCourse_mm = 2.0;
constexpr double kBrickLength_mm = 4.0;

// FGDC-STD-013-2006 pattern 642 (dolostone or dolomite): the limestone brick bond with its
// joints leaning, which is what tells the two apart in the standard's chart (drawn from memory
// of the chart, not traced).
constexpr double kDoloJointLean_mm = 1.0;

// Pattern 607 (massive sand or sandstone): a stipple of fine dots. The dots sit one per 1 mm
// cell, moved within it by a fixed hash of the cell, so the stipple looks irregular but every
// backend and every run draws the same dots.
constexpr double kSandCell_mm = 1.0;
constexpr double kSandDotRadius_mm = 0.12;

// Pattern 620 (clay or clay shale): short horizontal dashes in rows, alternate rows offset by
// half a period.
constexpr double kClayRow_mm = 1.2;
constexpr double kClayDash_mm = 1.6;
constexpr double kClayGap_mm = 0.8;

// Pattern 601 (gravel or conglomerate): small open rings of unequal size, staggered.
constexpr double kGravelRow_mm = 2.0;
constexpr double kGravelPitch_mm = 2.4;
constexpr double kGravelMinRadius_mm = 0.35;
constexpr double kGravelMaxRadius_mm = 0.6;

// Pattern 717 (basaltic flows) and 711 (tuffaceous rock): both numbers are checked, the drawing
// is not. We use staggered "v" marks, the usual sign for volcanic rock on logs (common
// practice); the tuffaceous variant adds the sand stipple between smaller, sparser marks, so
// the two never look alike.
constexpr double kBasaltRow_mm = 2.0;
constexpr double kBasaltPitch_mm = 2.6;
constexpr double kBasaltVWidth_mm = 1.1;
constexpr double kBasaltVHeight_mm = 0.9;
constexpr double kTuffRow_mm = 2.6;
constexpr double kTuffPitch_mm = 3.4;
constexpr double kTuffVWidth_mm = 0.8;
constexpr double kTuffVHeight_mm = 0.7;

// atollog's own reef-framework pattern: staggered rows of small domes (open upward arcs),
// because the standard has none for reef rock.
constexpr double kDomeRow_mm = 2.5;
constexpr double kDomePitch_mm = 3.0;
constexpr double kDomeRadius_mm = 0.8;

double firstMultipleAtOrBefore(double v, double step) {
    return std::floor(v / step) * step;
}

/// A number in [0, 1) fixed by a cell's indices (SplitMix64's finaliser, Steele, Lea & Flood
/// 2014), so stippled patterns repeat exactly wherever they are drawn.
double cellHash(long long i, long long j, unsigned salt) {
    auto z = static_cast<unsigned long long>(i) * 0x9E3779B97F4A7C15ULL ^
             (static_cast<unsigned long long>(j) + salt) * 0xC2B2AE3D27D4EB4FULL;
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    z ^= z >> 31;
    return static_cast<double>(z >> 11) * 0x1.0p-53;
}

/// Calls f(column, row, x, y) for every point of a staggered lattice (rows `row_mm` apart,
/// points `pitch_mm` apart, odd rows shifted by half a pitch) near the box, one lattice step
/// beyond each edge so marks cut by the clip are drawn too. The lattice is anchored at the
/// scene origin.
template <class F>
void forStaggeredLattice(const RectMm &box, double row_mm, double pitch_mm, F &&f) {
    const auto row0 = static_cast<long long>(std::floor(box.top_mm / row_mm)) - 1;
    const auto row1 = static_cast<long long>(std::ceil(box.bottom_mm() / row_mm)) + 1;
    for (long long r = row0; r <= row1; ++r) {
        const double shift = (r % 2 == 0) ? 0.0 : pitch_mm / 2;
        const auto c0 = static_cast<long long>(std::floor((box.left_mm - shift) / pitch_mm)) - 1;
        const auto c1 = static_cast<long long>(std::ceil((box.right_mm() - shift) / pitch_mm)) + 1;
        for (long long c = c0; c <= c1; ++c) {
            f(c, r, static_cast<double>(c) * pitch_mm + shift, static_cast<double>(r) * row_mm);
        }
    }
}

void addStipple(QPainterPath &dots, const RectMm &box, double cell_mm, unsigned salt) {
    const auto i0 = static_cast<long long>(std::floor(box.left_mm / cell_mm)) - 1;
    const auto i1 = static_cast<long long>(std::ceil(box.right_mm() / cell_mm)) + 1;
    const auto j0 = static_cast<long long>(std::floor(box.top_mm / cell_mm)) - 1;
    const auto j1 = static_cast<long long>(std::ceil(box.bottom_mm() / cell_mm)) + 1;
    for (long long j = j0; j <= j1; ++j) {
        for (long long i = i0; i <= i1; ++i) {
            const double x = (static_cast<double>(i) + 0.15 + 0.7 * cellHash(i, j, salt)) * cell_mm;
            const double y =
                (static_cast<double>(j) + 0.15 + 0.7 * cellHash(i, j, salt + 1)) * cell_mm;
            dots.addEllipse(QPointF(x, y), kSandDotRadius_mm, kSandDotRadius_mm);
        }
    }
}

void paintDolostone(QPainter &p, const RectMm &box) {
    QPainterPath path;
    const double y0 = firstMultipleAtOrBefore(box.top_mm, kBrickCourse_mm);
    for (double y = y0; y <= box.bottom_mm(); y += kBrickCourse_mm) {
        path.moveTo(box.left_mm, y);
        path.lineTo(box.right_mm(), y);
        const auto course = static_cast<long long>(std::llround(y / kBrickCourse_mm));
        const double shift = (course % 2 == 0) ? 0.0 : kBrickLength_mm / 2;
        // Start one brick early: a leaning joint that begins left of the box still crosses it.
        const double x0 =
            firstMultipleAtOrBefore(box.left_mm - shift - kDoloJointLean_mm, kBrickLength_mm) +
            shift;
        for (double x = x0; x <= box.right_mm(); x += kBrickLength_mm) {
            path.moveTo(x, y);
            path.lineTo(x + kDoloJointLean_mm, y + kBrickCourse_mm);
        }
    }
    p.drawPath(path);
}

void paintSand(QPainter &p, const RectMm &box) {
    QPainterPath dots;
    addStipple(dots, box, kSandCell_mm, 7u);
    p.fillPath(dots, Qt::black);
}

void paintClay(QPainter &p, const RectMm &box) {
    QPainterPath path;
    const double period = kClayDash_mm + kClayGap_mm;
    forStaggeredLattice(box, kClayRow_mm, period, [&](long long, long long, double x, double y) {
        path.moveTo(x, y);
        path.lineTo(x + kClayDash_mm, y);
    });
    p.drawPath(path);
}

void paintGravel(QPainter &p, const RectMm &box) {
    QPainterPath path;
    forStaggeredLattice(
        box, kGravelRow_mm, kGravelPitch_mm, [&](long long c, long long r, double x, double y) {
            const double radius = kGravelMinRadius_mm +
                                  (kGravelMaxRadius_mm - kGravelMinRadius_mm) * cellHash(c, r, 3u);
            // Slightly flattened, as pebbles lie on their flat side.
            path.addEllipse(QPointF(x, y + kGravelRow_mm / 2), radius, radius * 0.75);
        });
    p.drawPath(path);
}

void addVMarks(QPainterPath &path, const RectMm &box, double row_mm, double pitch_mm,
               double width_mm, double height_mm) {
    forStaggeredLattice(box, row_mm, pitch_mm, [&](long long, long long, double x, double y) {
        const double top = y + (row_mm - height_mm) / 2;
        path.moveTo(x - width_mm / 2, top);
        path.lineTo(x, top + height_mm);
        path.lineTo(x + width_mm / 2, top);
    });
}

void paintBasalt(QPainter &p, const RectMm &box) {
    QPainterPath path;
    addVMarks(path, box, kBasaltRow_mm, kBasaltPitch_mm, kBasaltVWidth_mm, kBasaltVHeight_mm);
    p.drawPath(path);
}

void paintVolcaniclastic(QPainter &p, const RectMm &box) {
    QPainterPath path;
    addVMarks(path, box, kTuffRow_mm, kTuffPitch_mm, kTuffVWidth_mm, kTuffVHeight_mm);
    p.drawPath(path);
    QPainterPath dots;
    // A sparser stipple than sand (cells twice as large), so the marks stay the main sign.
    addStipple(dots, box, 2 * kSandCell_mm, 11u);
    p.fillPath(dots, Qt::black);
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
    // A box under a few device pixels shows no pattern, only a smudge of its lines: skip it
    // (its fill colour is still painted). Why: a whole-campaign panel at screen or poster size
    // has tens of thousands of such boxes, and their line work was most of the painting time.
    const QRectF device = p.worldTransform().mapRect(
        QRectF(box.left_mm, box.top_mm, box.width_mm, box.height_mm));
    if (device.height() < kSmallestPatternedBox_px || device.width() < kSmallestPatternedBox_px) {
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
    case FillPattern::Dolostone:
        paintDolostone(p, box);
        break;
    case FillPattern::Sand:
        paintSand(p, box);
        break;
    case FillPattern::Clay:
        paintClay(p, box);
        break;
    case FillPattern::Gravel:
        paintGravel(p, box);
        break;
    case FillPattern::Basalt:
        paintBasalt(p, box);
        break;
    case FillPattern::Volcaniclastic:
        paintVolcaniclastic(p, box);
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
