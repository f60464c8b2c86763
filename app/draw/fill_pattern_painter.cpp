#include "draw/fill_pattern_painter.hpp"

#include <QPainter>
#include <QPainterPath>
#include <QPen>
#include <QTransform>

#include <cmath>

namespace atollog::draw {

namespace {

constexpr double kPatternLine_mm = 0.15;

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
// backend and every run draws the same dots. The hash takes the cell indices modulo 8, so the
// stipple repeats every 8 mm: raster output paints it from a tile of whole repeats (see
// fill_pattern_tile.hpp), and a repeat of 64 irregular dots hardly shows.
constexpr double kSandCell_mm = 1.0;
constexpr double kSandDotRadius_mm = 0.12;
constexpr long long kSandRepeatCells = 8;

// Pattern 620 (clay or clay shale): short horizontal dashes in rows, alternate rows offset by
// half a period.
constexpr double kClayRow_mm = 1.2;
constexpr double kClayDash_mm = 1.6;
constexpr double kClayGap_mm = 0.8;

// Pattern 601 (gravel or conglomerate): small open rings of unequal size, staggered. The sizes
// repeat every 5 rings along a row and every 4 rows (12 x 8 mm), so the pattern tiles.
constexpr double kGravelRow_mm = 2.0;
constexpr double kGravelPitch_mm = 2.4;
constexpr long long kGravelRepeatColumns = 5;
constexpr long long kGravelRepeatRows = 4;
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
// The tuff's stipple has one dot per cell of half a pitch by half a row (1.7 x 1.3 mm, about
// twice a sand cell, so the marks stay the main sign), repeating every 8 x 8 cells: 13.6 x
// 10.4 mm, four pitches by four rows of the marks, so marks and dots repeat together.
constexpr double kTuffCellWidth_mm = kTuffPitch_mm / 2;
constexpr double kTuffCellHeight_mm = kTuffRow_mm / 2;
constexpr long long kTuffRepeatColumns = 8;
constexpr long long kTuffRepeatRows = 8;

// atollog's own reef-framework pattern: staggered rows of small domes (open upward arcs),
// because the standard has none for reef rock.
constexpr double kDomeRow_mm = 2.5;
constexpr double kDomePitch_mm = 3.0;
constexpr double kDomeRadius_mm = 0.8;

double firstMultipleAtOrBefore(double v, double step) {
    return std::floor(v / step) * step;
}

/// i modulo n in [0, n), also for negative i.
long long wrapped(long long i, long long n) {
    const long long r = i % n;
    return r < 0 ? r + n : r;
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

/// A pattern's marks: stroked lines and filled dots.
struct PatternPaths {
    QPainterPath lines;
    QPainterPath dots;
};

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

/// One dot per cell, placed by a hash of the cell's indices taken modulo the repeat, so the
/// stipple repeats every repeat_i x repeat_j cells.
void addStipple(QPainterPath &dots, const RectMm &box, double cell_w_mm, double cell_h_mm,
                long long repeat_i, long long repeat_j, unsigned salt) {
    const auto i0 = static_cast<long long>(std::floor(box.left_mm / cell_w_mm)) - 1;
    const auto i1 = static_cast<long long>(std::ceil(box.right_mm() / cell_w_mm)) + 1;
    const auto j0 = static_cast<long long>(std::floor(box.top_mm / cell_h_mm)) - 1;
    const auto j1 = static_cast<long long>(std::ceil(box.bottom_mm() / cell_h_mm)) + 1;
    for (long long j = j0; j <= j1; ++j) {
        for (long long i = i0; i <= i1; ++i) {
            const long long hi = wrapped(i, repeat_i), hj = wrapped(j, repeat_j);
            const double x =
                (static_cast<double>(i) + 0.15 + 0.7 * cellHash(hi, hj, salt)) * cell_w_mm;
            const double y =
                (static_cast<double>(j) + 0.15 + 0.7 * cellHash(hi, hj, salt + 1)) * cell_h_mm;
            dots.addEllipse(QPointF(x, y), kSandDotRadius_mm, kSandDotRadius_mm);
        }
    }
}

void addDolostone(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
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
}

void addSand(PatternPaths &out, const RectMm &box) {
    QPainterPath &dots = out.dots;
    addStipple(dots, box, kSandCell_mm, kSandCell_mm, kSandRepeatCells, kSandRepeatCells, 7u);
}

void addClay(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
    const double period = kClayDash_mm + kClayGap_mm;
    forStaggeredLattice(box, kClayRow_mm, period, [&](long long, long long, double x, double y) {
        path.moveTo(x, y);
        path.lineTo(x + kClayDash_mm, y);
    });
}

void addGravel(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
    forStaggeredLattice(
        box, kGravelRow_mm, kGravelPitch_mm, [&](long long c, long long r, double x, double y) {
            const double radius =
                kGravelMinRadius_mm +
                (kGravelMaxRadius_mm - kGravelMinRadius_mm) *
                    cellHash(wrapped(c, kGravelRepeatColumns), wrapped(r, kGravelRepeatRows), 3u);
            // Slightly flattened, as pebbles lie on their flat side.
            path.addEllipse(QPointF(x, y + kGravelRow_mm / 2), radius, radius * 0.75);
        });
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

void addBasalt(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
    addVMarks(path, box, kBasaltRow_mm, kBasaltPitch_mm, kBasaltVWidth_mm, kBasaltVHeight_mm);
}

void addVolcaniclastic(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
    addVMarks(path, box, kTuffRow_mm, kTuffPitch_mm, kTuffVWidth_mm, kTuffVHeight_mm);
    QPainterPath &dots = out.dots;
    addStipple(dots, box, kTuffCellWidth_mm, kTuffCellHeight_mm, kTuffRepeatColumns,
               kTuffRepeatRows, 11u);
}

void addBricks(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
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
}

void addDomes(PatternPaths &out, const RectMm &box) {
    QPainterPath &path = out.lines;
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
}

} // namespace

PeriodMm fillPatternPeriod(FillPattern pattern) {
    switch (pattern) {
    case FillPattern::Limestone:
    case FillPattern::Dolostone:
        // Two courses (the joints alternate) by one brick.
        return {kBrickLength_mm, 2 * kBrickCourse_mm};
    case FillPattern::Sand:
        return {kSandRepeatCells * kSandCell_mm, kSandRepeatCells * kSandCell_mm};
    case FillPattern::Clay:
        return {kClayDash_mm + kClayGap_mm, 2 * kClayRow_mm};
    case FillPattern::Gravel:
        return {kGravelRepeatColumns * kGravelPitch_mm, kGravelRepeatRows * kGravelRow_mm};
    case FillPattern::Basalt:
        return {kBasaltPitch_mm, 2 * kBasaltRow_mm};
    case FillPattern::Volcaniclastic:
        return {kTuffRepeatColumns * kTuffCellWidth_mm, kTuffRepeatRows * kTuffCellHeight_mm};
    case FillPattern::ReefFramework:
        return {kDomePitch_mm, 2 * kDomeRow_mm};
    case FillPattern::None:
        break;
    }
    return {0.0, 0.0};
}

bool boxTooSmallForPattern(const QTransform &to_device, const RectMm &box) {
    const QRectF device =
        to_device.mapRect(QRectF(box.left_mm, box.top_mm, box.width_mm, box.height_mm));
    return device.height() < kSmallestPatternedBox_px || device.width() < kSmallestPatternedBox_px;
}

void drawFillPatternLineWork(QPainter &p, FillPattern pattern, const RectMm &region,
                             const QTransform &scene_to_painter) {
    PatternPaths paths;
    switch (pattern) {
    case FillPattern::Limestone:
        addBricks(paths, region);
        break;
    case FillPattern::Dolostone:
        addDolostone(paths, region);
        break;
    case FillPattern::Sand:
        addSand(paths, region);
        break;
    case FillPattern::Clay:
        addClay(paths, region);
        break;
    case FillPattern::Gravel:
        addGravel(paths, region);
        break;
    case FillPattern::Basalt:
        addBasalt(paths, region);
        break;
    case FillPattern::Volcaniclastic:
        addVolcaniclastic(paths, region);
        break;
    case FillPattern::ReefFramework:
        addDomes(paths, region);
        break;
    case FillPattern::None:
        break;
    }
    double line_width = kPatternLine_mm;
    if (!scene_to_painter.isIdentity()) {
        paths.lines = scene_to_painter.map(paths.lines);
        paths.dots = scene_to_painter.map(paths.dots);
        line_width *= std::sqrt(std::abs(scene_to_painter.determinant()));
    }
    QPen pen(Qt::black);
    pen.setWidthF(line_width);
    pen.setCapStyle(Qt::FlatCap);
    p.setPen(pen);
    p.setBrush(Qt::NoBrush);
    if (!paths.lines.isEmpty()) {
        p.drawPath(paths.lines);
    }
    if (!paths.dots.isEmpty()) {
        p.fillPath(paths.dots, Qt::black);
    }
}

void paintFillPattern(QPainter &p, FillPattern pattern, const RectMm &box) {
    if (pattern == FillPattern::None) {
        return;
    }
    // A box under a few device pixels shows no pattern, only a smudge of its lines: skip it
    // (its fill colour is still painted). Why: a whole-campaign panel at screen or poster size
    // has tens of thousands of such boxes, and their line work was most of the painting time.
    if (boxTooSmallForPattern(p.worldTransform(), box)) {
        return;
    }
    p.save();
    p.setClipRect(QRectF(box.left_mm, box.top_mm, box.width_mm, box.height_mm), Qt::IntersectClip);
    drawFillPatternLineWork(p, pattern, box, QTransform());
    p.restore();
}

} // namespace atollog::draw
