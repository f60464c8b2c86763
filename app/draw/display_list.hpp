#pragma once

#include "draw/colour.hpp"
#include "draw/scene_rect.hpp"

#include <optional>
#include <string>
#include <variant>
#include <vector>

namespace atollog::draw {

/// What a drawn item stands for. Tests find items by role, the viewer builds tooltips from role
/// and key; painting ignores both.
enum class ItemRole {
    None,
    Title,
    Subtitle,
    DepthAxis,
    DepthTick,
    DepthLabel,
    SampleTick,
    RecoveryRun,
    TaxonName,
    TaxonRangeBar,
    Occurrence,
    PickMarker,
    PickBracket,
    PickExtendedBracket,
    LegendSwatch,
    LegendText,
    Frame,
    // Age-depth plot (keys: tie label for ties, hiatus depth "%.2f" for hiatuses).
    AgeAxis,
    AgeTick,
    AgeLabel,
    AgeEnvelope, // the 95 % band: one filled polygon with its outline (key "band")
    AgeMedian,
    AgeTieMarker,
    AgeTieBar,     // depth bracket (vertical) and age range (horizontal) of a tie
    AgeTieLabel,   // a tie's label, and the leader to it when it had to move
    AgeTieOutlier, // the ring around a tie singled out by the leave-one-out check
    Hiatus,
    HiatusLabel,
    ReferenceLine,
    // Hole column (keys: "top-base" in m with two decimals for intervals, e.g. "12.50-14.00";
    // the surface word for surfaces; "<run id> recovered" / "<run id> unrecovered" for runs).
    LithologyInterval,
    Surface,
    TextureScale, // the texture-class ticks and names above the lithology track
    DrilledBase,  // the line and label at the hole's drilled base (key: the hole id)
    // Correlation panel (keys: the event id for ties, the isochron label for isochrons, the hole
    // id for column notes, the tick value as labelled for the shared axis).
    PanelAxis,      // the shared vertical axis on the left: line, ticks and its title
    PanelAxisLabel, // its tick labels
    SeaLevel,       // the sea-level line across an elevation panel (key "0")
    ColumnNote,     // a note over a column's header, e.g. "not flattened"
    TieLine,        // observed levels joined column to column, and the bracket ends
    TieBand,        // the brackets joined column to column: one translucent polygon per pair
    TieLabel,
    Isochron,     // the median depth joined column to column
    IsochronBand, // the 2.5-97.5 % depth range joined column to column
    IsochronLabel,
    // Hole column, data tracks (keys: the taxon id; the zone name; the date id; "median" or
    // "band" for the age model; the tick value as labelled for the age scale).
    ColumnTaxonName,     // the taxon's name rotated over its lane
    ColumnTaxonBar,      // shallowest to deepest counted in-place find
    ColumnTaxonFind,     // a counted in-place find
    ColumnTaxonExcluded, // a reworked or caved find, hollow, never part of the bar
    ColumnZone,          // a zone's box, and its edge lines
    ColumnZoneBracket,   // the uncertain part of a zone boundary: its box and hatch
    ColumnZoneName,
    ColumnZoneScheme, // the scheme's heading over its lane (key: the scheme)
    ColumnAgeScale,   // the age track's frame, ticks, grid lines and labels
    ColumnAgeModel,   // the age model's median line ("median") or 95 % band ("band")
    ColumnDateMarker,
    ColumnDateBar, // a date's age range (horizontal) and depth bracket (vertical)
    // x-y plots (xy_plot_frame.hpp): axes (keys "x <label>", "y <label>", "x heading",
    // "y heading"); the frame box and grid keep Frame.
    XyAxis,      // tick marks and the axis headings
    XyAxisLabel, // tick labels
    // Subsidence against age (keys: "<hole> <sample>" for points, the hole for its line).
    SubsidencePoint,
    SubsidenceBar,      // a point's 95 % range in age (horizontal) and subsidence (vertical)
    SubsidenceRateLine, // a hole's fitted rate line, and its 95 % band
    // Rate against depth or age (key: the interval's label).
    RateBar,  // the median rate as a horizontal bar over the interval's span
    RateBand, // the 2.5-97.5 % rate range over the same span
    // Line-of-correlation cross-plot (keys: the event id; "segment <n>" counted from 1;
    // "x <depth>" / "y <depth>" (m, two decimals) for the holes' surfaces).
    LocEventMarker,  // the event's level in both holes
    LocEventBracket, // the box over the event's two depth brackets
    LocEventLabel,
    LocOffLine,      // the ring around an event flagged off the line
    LocSegment,      // a fitted piece of the line
    LocSegmentBand,  // its 95 % band
    LocSurface,      // a logged surface of either hole, across the plot
    // Age against chain distance (key: the hole for points, "fit" for the line).
    ChainPoint,
    ChainBar,   // a hole's 95 % range in distance (horizontal) and age (vertical)
    ChainLabel, // the hole's name beside its point
    ChainFit,   // the fitted migration line, and its 95 % band
};

/// The role and the identifier of the datum an item draws (taxon id, event id, sample id).
struct ItemTag {
    ItemRole role = ItemRole::None;
    std::string key;
};

enum class DashStyle { Solid, Dashed, Dotted };

struct Stroke {
    Colour colour;
    double width_mm = 0.25;
    DashStyle dash = DashStyle::Solid;
};

/// Area fills drawn as vector line work into SVG and PDF, so they stay sharp, and from cached
/// tiles of that line work on raster devices (fill_pattern_tile_brush.hpp); each is anchored at
/// the scene origin, so boxes that touch continue one another. The numbered ones
/// follow the style of FGDC-STD-013-2006 section 37 (numbers and names checked against a
/// copy of the standard's pattern chart; the line work is drawn from memory, see
/// fill_pattern_painter.cpp): Limestone 627, Dolostone 642, Sand 607 (massive sand or
/// sandstone), Clay 620 (clay or clay shale), Gravel 601 (gravel or conglomerate), Basalt 717
/// (basaltic flows), Volcaniclastic 711 (tuffaceous rock). The standard has no reef pattern, so
/// ReefFramework is atollog's own: rows of small open arcs standing for coral heads.
enum class FillPattern {
    None,
    Limestone,
    Dolostone,
    Sand,
    Clay,
    Gravel,
    Basalt,
    Volcaniclastic,
    ReefFramework,
};

struct Rect {
    RectMm box;
    std::optional<Colour> fill;              // drawn first
    FillPattern pattern = FillPattern::None; // drawn over the fill, clipped to the box
    std::optional<Stroke> stroke;            // outline, drawn last
    ItemTag tag;
};

struct Line {
    PointMm from;
    PointMm to;
    Stroke stroke;
    ItemTag tag;
};

struct Polyline {
    std::vector<PointMm> points;
    Stroke stroke;
    ItemTag tag;
};

/// A closed area filled with one colour (e.g. an uncertainty band), with an optional outline.
/// The last point joins the first.
struct Polygon {
    std::vector<PointMm> points;
    Colour fill;
    std::optional<Stroke> stroke;
    ItemTag tag;
};

/// Horizontal placement of a text relative to its anchor, along the (rotated) baseline
/// direction. Vertically the anchor is the middle of the text's line box.
enum class TextAnchor { Start, Middle, End };
enum class FontWeight { Regular, Bold };

struct Text {
    PointMm anchor_mm;
    std::string text; // UTF-8
    TextAnchor anchor = TextAnchor::Start;
    double size_pt = 8.0;
    FontWeight weight = FontWeight::Regular;
    double rotation_deg = 0.0; // clockwise on paper, about the anchor; -90 reads bottom to top
    Colour colour;
    ItemTag tag;
};

enum class MarkerShape { Circle, Square, Diamond, TriangleUp, TriangleDown, HorizontalBar, Tick };

/// A small symbol centred on a point. `hollow` markers are outlined in `colour` with a white
/// inside, so they stay readable over a bar or a grid line.
struct Marker {
    PointMm centre_mm;
    MarkerShape shape = MarkerShape::Circle;
    double size_mm = 1.5; // width and height of the symbol's box
    Colour colour;
    bool hollow = false;
    double stroke_mm = 0.25;
    ItemTag tag;
};

using DisplayItem = std::variant<Rect, Line, Polyline, Polygon, Text, Marker>;

/// The scene-space box an item may paint into (text by its estimated extent, markers and
/// strokes with their line width). Conservative: used for culling, never for layout decisions.
RectMm itemBounds(const DisplayItem &item);
const ItemTag &itemTag(const DisplayItem &item);

/// A picture as plain data in paper millimetres, y down: what layouts produce, what tests inspect
/// and what every backend (PNG, SVG, PDF, the viewer) paints.
class DisplayList {
  public:
    void add(DisplayItem item) { items_.push_back(std::move(item)); }
    const std::vector<DisplayItem> &items() const { return items_; }
    std::size_t size() const { return items_.size(); }

    /// The paper the layout asked for; exporters use it as the page. When not set, the union
    /// of the item bounds is used.
    void setPage(RectMm page_mm) { page_mm_ = page_mm; }
    RectMm page() const;

    /// Union of itemBounds over all items; an empty list has an empty box at the origin.
    RectMm boundingBox() const;

    /// The items with this role, in drawing order (for tests and the viewer's hit tests).
    std::vector<const DisplayItem *> withRole(ItemRole role) const;

  private:
    std::vector<DisplayItem> items_;
    std::optional<RectMm> page_mm_;
};

} // namespace atollog::draw
