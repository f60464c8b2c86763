#include "draw/display_list_export.hpp"

#include "draw/output_file.hpp"
#include "draw/paint_display_list.hpp"

#include <QImage>
#include <QPainter>

#include <cmath>
#include <stdexcept>

namespace atollog::draw {

namespace {
constexpr double kMmPerInch = 25.4;
constexpr double kMaxSide_px = 32767.0; // QImage and QPainter coordinates are limited to this
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
    {
        QPainter painter(&image);
        paintDisplayList(painter, list, page, px_per_mm);
    }
    QFile file;
    openOutputFile(file, path, "PNG");
    if (!image.save(&file, "PNG")) {
        throw std::runtime_error("cannot write PNG file '" + path.string() +
                                 "': " + file.errorString().toStdString());
    }
    finishOutputFile(file, path, "PNG");
}

} // namespace atollog::draw
