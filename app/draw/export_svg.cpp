#include "draw/display_list_export.hpp"

#include "draw/output_file.hpp"
#include "draw/paint_display_list.hpp"

#include <QPainter>
#include <QSvgGenerator>

#include <cmath>
#include <stdexcept>

namespace atollog::draw {

namespace {
// The SVG user unit is a tenth of a millimetre: QSvgGenerator takes an integer size, and a
// tenth keeps the page within 0.1 mm of the chart. 254 dpi is ten units per millimetre.
constexpr double kUnitsPerMm = 10.0;
constexpr int kResolutionDpi = 254;
} // namespace

void exportSvg(const DisplayList &list, const std::filesystem::path &path,
               const std::string &title) {
    const RectMm page = list.page();
    const QSize size(static_cast<int>(std::ceil(page.width_mm * kUnitsPerMm - 1e-6)),
                     static_cast<int>(std::ceil(page.height_mm * kUnitsPerMm - 1e-6)));
    if (size.width() < 1 || size.height() < 1) {
        throw std::invalid_argument("SVG of an empty page (" + std::to_string(page.width_mm) +
                                    " x " + std::to_string(page.height_mm) + " mm)");
    }
    QFile file;
    openOutputFile(file, path, "SVG");
    QSvgGenerator generator;
    generator.setOutputDevice(&file);
    generator.setSize(size);
    generator.setViewBox(QRect(QPoint(0, 0), size));
    generator.setResolution(kResolutionDpi);
    generator.setTitle(QString::fromStdString(title));
    generator.setDescription(QStringLiteral("drawn by atollog"));
    {
        QPainter painter;
        if (!painter.begin(&generator)) {
            throw std::runtime_error("cannot start drawing SVG file '" + path.string() + "'");
        }
        paintDisplayList(painter, list, page, kUnitsPerMm);
        painter.end();
    }
    finishOutputFile(file, path, "SVG");
}

} // namespace atollog::draw
