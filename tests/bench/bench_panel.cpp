// Benchmark of the correlation panel: 20 holes x 5,000 logged intervals each (invented,
// deterministic: seed below), with runs, samples, 30 ties and 8 isochrons. Prints
//   1. the layout time of the whole panel and the time to paint it into a 4000 x 8000 image and
//      write the PNG (target: under 1 s together);
//   2. a viewer repaint: paintDisplayList of the whole list into a 1600 x 1000 image showing a
//      50 m window (target: under 10 ms), the part of it spent culling (a paint of the whole list
//      with nothing in view), and the alternative of laying out only the window (view window)
//      and painting that.
// Printed figures only; never a timed unit test.
#include "draw/paint_display_list.hpp"
#include "draw/display_list_export.hpp"
#include "draw/panel_layout.hpp"
#include "draw/panel_validation.hpp"

#include <QGuiApplication>
#include <QImage>
#include <QPainter>

#include <algorithm>
#include <chrono>
#include <thread>
#include <cstdint>
#include <cstdio>
#include <filesystem>
#include <random>
#include <string>
#include <vector>

using namespace atollog::draw;

namespace {

constexpr int kHoles = 20;
constexpr int kIntervals = 5000;
constexpr int kTies = 30;
constexpr int kIsochrons = 8;
constexpr int kRepaints = 20;
constexpr std::uint64_t kSeed = 770241;

/// Uniform in [0, 1) from the top 53 bits (the standard distributions differ between libraries).
double uniform01(std::mt19937_64 &rng) { return static_cast<double>(rng() >> 11) * 0x1.0p-53; }

double secondsSince(std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

PanelInput makePanel() {
    std::mt19937_64 rng(kSeed);
    const RockKind rocks[] = {RockKind::Limestone, RockKind::Limestone, RockKind::Limestone,
                              RockKind::Dolostone, RockKind::Sand,      RockKind::Clay};
    const TextureClass textures[] = {TextureClass::Mudstone,   TextureClass::Wackestone,
                                     TextureClass::Packstone,  TextureClass::Grainstone,
                                     TextureClass::Framestone, TextureClass::Rudstone};
    PanelInput in;
    in.title = "Benchmark panel (invented)";
    for (int h = 0; h < kHoles; ++h) {
        HoleColumnInput c;
        c.hole = "BN-" + std::to_string(h + 1);
        c.collar_elev_m = 1.0 + 5.0 * uniform01(rng);
        double top = 0.0;
        for (int i = 0; i < kIntervals; ++i) {
            const double base = top + 0.05 + 0.3 * uniform01(rng);
            const RockKind rock = rocks[rng() % 6];
            const TextureClass tex = rock == RockKind::Limestone || rock == RockKind::Dolostone
                                         ? textures[rng() % 6]
                                         : TextureClass::None;
            std::optional<SurfaceKind> surface;
            if (uniform01(rng) < 0.01) {
                surface = SurfaceKind::Exposure;
            }
            c.intervals.push_back({top, base, rock, tex, surface});
            top = base;
        }
        c.drilled_base_m = top;
        for (int r = 0; 3.0 * r < top; ++r) {
            const double rt = 3.0 * r, rb = std::min(rt + 3.0, top);
            c.runs.push_back({"R" + std::to_string(r + 1), rt, rb, (rb - rt) * uniform01(rng)});
            c.samples.push_back({c.hole + "-" + std::to_string(r + 1), (rt + rb) / 2});
        }
        in.columns.push_back(std::move(c));
    }
    for (int t = 0; t < kTies; ++t) {
        PanelTie tie{"E" + std::to_string(t), {}};
        for (std::size_t h = 0; h < in.columns.size(); ++h) {
            if (uniform01(rng) < 0.8) {
                const double level = (t + 0.5) / kTies * 0.95 * in.columns[h].drilled_base_m;
                tie.at.push_back({h, level - 1.0, level + 1.5, level});
            }
        }
        in.ties.push_back(std::move(tie));
    }
    for (int k = 0; k < kIsochrons; ++k) {
        PanelIsochron iso{std::to_string(k + 1) + ".0 Ma", k + 1.0, {}};
        for (std::size_t h = 0; h < in.columns.size(); ++h) {
            const double q500 = (k + 0.7) / kIsochrons * 0.95 * in.columns[h].drilled_base_m;
            iso.at.push_back({h, q500 - 4.0, q500, q500 + 5.0});
        }
        in.isochrons.push_back(std::move(iso));
    }
    return in;
}

double repaintSeconds(const DisplayList &list, const RectMm &visible, double px_per_mm,
                      PaintStats &stats) {
    QImage image(1600, 1000, QImage::Format_RGB32);
    const auto t0 = std::chrono::steady_clock::now();
    for (int i = 0; i < kRepaints; ++i) {
        image.fill(Qt::white);
        QPainter painter(&image);
        stats = paintDisplayList(painter, list, visible, px_per_mm);
    }
    return secondsSince(t0) / kRepaints;
}

} // namespace

int main(int argc, char *argv[]) {
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QGuiApplication app(argc, argv);
    const PanelInput in = makePanel();
    PanelView view;
    view.scale_ratio = 300.0; // about 1,000 m of hole on a page twice as tall as wide

    auto t0 = std::chrono::steady_clock::now();
    PanelGeometry g;
    const DisplayList list = layoutPanel(in, view, &g);
    const double layout_s = secondsSince(t0);
    const RectMm page = list.page();

    t0 = std::chrono::steady_clock::now();
    QImage image(4000, 8000, QImage::Format_RGB32);
    image.fill(Qt::white);
    const double px_per_mm = std::min(4000.0 / page.width_mm, 8000.0 / page.height_mm);
    {
        QPainter painter(&image);
        paintDisplayList(painter, list, page, px_per_mm);
    }
    const double paint_s = secondsSince(t0);
    t0 = std::chrono::steady_clock::now();
    const auto png = std::filesystem::temp_directory_path() / "bench_panel.png";
    const bool saved = image.save(QString::fromStdString(png.string()), "PNG");
    const double save_s = secondsSince(t0);

    std::printf("panel: %d holes x %d intervals, %zu items, page %.0f x %.0f mm\n", kHoles,
                kIntervals, list.size(), page.width_mm, page.height_mm);
    std::printf("layout whole panel:        %8.1f ms\n", layout_s * 1e3);
    std::printf("paint 4000 x 8000:         %8.1f ms (%.2f px/mm)\n", paint_s * 1e3, px_per_mm);
    std::printf("write PNG:                 %8.1f ms (%s)\n", save_s * 1e3,
                saved ? png.string().c_str() : "FAILED");
    t0 = std::chrono::steady_clock::now();
    const auto png_fast = std::filesystem::temp_directory_path() / "bench_panel_fast.png";
    image.save(QString::fromStdString(png_fast.string()), "PNG", 90);
    std::printf("  PNG at quality 90:       %8.1f ms (less zlib effort)\n", secondsSince(t0) * 1e3);
    // The real export path (what `atollog panel --out x.png` runs): bands painted on threads,
    // PNG quality 90, at the resolution that gives the same 8,000 px height.
    t0 = std::chrono::steady_clock::now();
    const auto png_export = std::filesystem::temp_directory_path() / "bench_panel_export.png";
    exportPng(list, png_export, px_per_mm * 25.4);
    const double export_s = secondsSince(t0);
    std::printf("exportPng (bands on %u threads, quality 90): %8.1f ms; with layout %8.1f ms "
                "(target < 1000 ms)\n",
                std::max(1u, std::thread::hardware_concurrency()), export_s * 1e3,
                (layout_s + export_s) * 1e3);
    t0 = std::chrono::steady_clock::now();
    validatePanelInput(in, view);
    std::printf("  input checks alone:      %8.1f ms\n", secondsSince(t0) * 1e3);
    // What the fill patterns cost: the same list with plain fills.
    DisplayList plain;
    for (const DisplayItem &item : list.items()) {
        DisplayItem copy = item;
        if (Rect *r = std::get_if<Rect>(&copy)) {
            r->pattern = FillPattern::None;
        }
        plain.add(std::move(copy));
    }
    plain.setPage(page);
    t0 = std::chrono::steady_clock::now();
    {
        image.fill(Qt::white);
        QPainter painter(&image);
        paintDisplayList(painter, plain, page, px_per_mm);
    }
    std::printf("  paint without patterns:  %8.1f ms\n", secondsSince(t0) * 1e3);
    std::printf("total layout + export:     %8.1f ms (target < 1000 ms)\n",
                (layout_s + paint_s + save_s) * 1e3);

    // The viewer: 50 m of axis on 1000 px, starting 400 m down, the first columns in view.
    const double window_top = 400.0, window_m = 50.0;
    const double view_px_per_mm = 1000.0 / (window_m * g.mm_per_m);
    const RectMm visible{g.column_boxes[0].left_mm - 20.0,
                         g.axis_origin_y_mm + (window_top - g.axis_top_m) * g.mm_per_m,
                         1600.0 / view_px_per_mm, 1000.0 / view_px_per_mm};
    PaintStats stats;
    const double repaint_s = repaintSeconds(list, visible, view_px_per_mm, stats);
    std::printf("repaint 1600 x 1000, 50 m: %8.2f ms (target < 10 ms; %zu painted, %zu culled)\n",
                repaint_s * 1e3, stats.painted, stats.culled);
    const RectMm nowhere{-1e6, -1e6, 1.0, 1.0};
    const double cull_s = repaintSeconds(list, nowhere, view_px_per_mm, stats);
    std::printf("  of which culling alone:  %8.2f ms (%zu items tested)\n", cull_s * 1e3,
                stats.culled);

    PanelView windowed = view;
    windowed.window_top_m = window_top;
    windowed.window_base_m = window_top + window_m;
    t0 = std::chrono::steady_clock::now();
    PanelGeometry wg;
    DisplayList window_list;
    for (int i = 0; i < kRepaints; ++i) {
        window_list = layoutPanel(in, windowed, &wg);
    }
    const double window_layout_s = secondsSince(t0) / kRepaints;
    const RectMm wvisible{wg.column_boxes[0].left_mm - 20.0, wg.axis_origin_y_mm,
                          1600.0 / view_px_per_mm, 1000.0 / view_px_per_mm};
    const double window_paint_s = repaintSeconds(window_list, wvisible, view_px_per_mm, stats);
    {
        PaintStats plain_stats;
        std::printf("  same, no fill patterns:  %8.2f ms\n",
                    repaintSeconds(plain, visible, view_px_per_mm, plain_stats) * 1e3);
    }
    std::printf("windowed layout (50 m):    %8.2f ms (%zu items)\n", window_layout_s * 1e3,
                window_list.size());
    std::printf("  + paint of it:           %8.2f ms (%zu painted, %zu culled)\n",
                window_paint_s * 1e3, stats.painted, stats.culled);
    return saved ? 0 : 1;
}
