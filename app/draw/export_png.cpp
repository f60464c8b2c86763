#include "draw/display_list_export.hpp"

#include "draw/output_file.hpp"
#include "draw/paint_display_list.hpp"
#include "draw/png_encoder.hpp"

#include <QImage>
#include <QPainter>

#include <algorithm>
#include <cmath>
#include <exception>
#include <stdexcept>
#include <thread>
#include <vector>

namespace atollog::draw {

namespace {
constexpr double kMmPerInch = 25.4;
constexpr double kMaxSide_px = 32767.0; // QImage and QPainter coordinates are limited to this
// Below this many rows a band is not worth a thread.
constexpr int kMinBandRows = 512;

int hardwareThreads() {
    return static_cast<int>(std::max(1u, std::thread::hardware_concurrency()));
}

/// Paints the list into horizontal bands of `image` at once, one thread per band, each through
/// its own QImage over the band's rows (painting on separate QImages from several threads is
/// supported by Qt). Each band culls to its own part of the page, so the bands together paint
/// exactly what one pass would (an item crossing a band edge is painted, clipped, in both).
void paintInBands(QImage &image, const DisplayList &list, const RectMm &page, double px_per_mm) {
    const int rows = image.height();
    const int bands = std::clamp(rows / kMinBandRows, 1, hardwareThreads());
    std::vector<std::thread> threads;
    std::vector<std::exception_ptr> errors(static_cast<std::size_t>(bands));
    for (int b = 0; b < bands; ++b) {
        const int first = rows * b / bands, last = rows * (b + 1) / bands;
        auto work = [&, b, first, last] {
            try {
                QImage band(image.scanLine(first), image.width(), last - first,
                            image.bytesPerLine(), image.format());
                const double top_mm = page.top_mm + first / px_per_mm;
                const RectMm part{page.left_mm, top_mm, page.width_mm, (last - first) / px_per_mm};
                QPainter painter(&band); // the band's row 0 is the page's row `first`
                paintDisplayList(painter, list, part, px_per_mm);
            } catch (...) {
                errors[static_cast<std::size_t>(b)] = std::current_exception();
            }
        };
        if (b + 1 == bands)
            work(); // the calling thread takes the last band
        else
            threads.emplace_back(work);
    }
    for (std::thread &t : threads)
        t.join();
    for (const std::exception_ptr &e : errors)
        if (e)
            std::rethrow_exception(e);
}
} // namespace

void exportPng(const DisplayList &list, const std::filesystem::path &path, double dpi) {
    if (!std::isfinite(dpi) || dpi <= 0.0) {
        throw std::invalid_argument("PNG resolution must be a positive number of dpi, got " +
                                    std::to_string(dpi));
    }
    const RectMm page = list.page();
    const double px_per_mm = dpi / kMmPerInch;
    const double width_px = std::ceil(page.width_mm * px_per_mm - 1e-6);
    const double height_px = std::ceil(page.height_mm * px_per_mm - 1e-6);
    if (width_px < 1 || height_px < 1 || width_px > kMaxSide_px || height_px > kMaxSide_px) {
        throw std::invalid_argument(
            "PNG of " + std::to_string(page.width_mm) + " x " + std::to_string(page.height_mm) +
            " mm at " + std::to_string(dpi) + " dpi would be " + std::to_string(width_px) + " x " +
            std::to_string(height_px) + " px; each side must be 1 to 32767 px");
    }
    QImage image(static_cast<int>(width_px), static_cast<int>(height_px), QImage::Format_RGB32);
    image.fill(Qt::white);
    const int dots_per_metre = static_cast<int>(std::lround(dpi * 1000.0 / kMmPerInch));
    image.setDotsPerMeterX(dots_per_metre);
    image.setDotsPerMeterY(dots_per_metre);
    paintInBands(image, list, page, px_per_mm);
    // Our own encoder rather than QImage::save: Qt's writer runs zlib on one thread after
    // libpng's filter search, and at its fast settings stores the pixels uncompressed (96 MB for
    // a 4,000 x 8,000 px panel). This one writes 8 MB in half the time on one thread, a third
    // on two.
    const QByteArray png = encodePng(image, hardwareThreads());
    QFile file;
    openOutputFile(file, path, "PNG");
    if (file.write(png) != png.size()) {
        throw std::runtime_error("cannot write PNG file '" + path.string() +
                                 "': " + file.errorString().toStdString());
    }
    finishOutputFile(file, path, "PNG");
}

} // namespace atollog::draw
