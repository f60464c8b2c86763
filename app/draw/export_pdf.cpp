#include "draw/display_list_export.hpp"

#include "draw/output_file.hpp"
#include "draw/paint_display_list.hpp"

#include <QPageLayout>
#include <QPageSize>
#include <QPainter>
#include <QPdfWriter>

#include <algorithm>
#include <stdexcept>

namespace atollog::draw {

namespace {

constexpr int kResolutionDpi = 1200; // device units of the PDF painter; vector output regardless
constexpr double kMmPerInch = 25.4;

QPageSize toQPageSize(PdfPageSize page, const RectMm &chart) {
    switch (page) {
    case PdfPageSize::FitChart:
        return QPageSize(QSizeF(chart.width_mm, chart.height_mm), QPageSize::Millimeter,
                         QStringLiteral("chart"), QPageSize::ExactMatch);
    case PdfPageSize::A4:
        return QPageSize(QPageSize::A4);
    case PdfPageSize::A3:
        return QPageSize(QPageSize::A3);
    case PdfPageSize::Letter:
        return QPageSize(QPageSize::Letter);
    }
    throw std::invalid_argument("unknown PDF page size");
}

} // namespace

void exportPdf(const DisplayList &list, const std::filesystem::path &path, PdfPageSize page,
               const std::string &title) {
    const RectMm chart = list.page();
    if (chart.width_mm <= 0.0 || chart.height_mm <= 0.0) {
        throw std::invalid_argument("PDF of an empty page (" + std::to_string(chart.width_mm) +
                                    " x " + std::to_string(chart.height_mm) + " mm)");
    }
    QFile file;
    openOutputFile(file, path, "PDF");
    QPdfWriter writer(&file);
    writer.setTitle(QString::fromStdString(title));
    writer.setCreator(QStringLiteral("atollog"));
    writer.setResolution(kResolutionDpi);
    const auto orientation = (page != PdfPageSize::FitChart && chart.width_mm > chart.height_mm)
                                 ? QPageLayout::Landscape
                                 : QPageLayout::Portrait;
    // The chart carries its own margins, so the page has none.
    writer.setPageLayout(QPageLayout(toQPageSize(page, chart), orientation, QMarginsF(0, 0, 0, 0),
                                     QPageLayout::Millimeter));

    const QRectF paper_mm = writer.pageLayout().fullRect(QPageLayout::Millimeter);
    const double shrink =
        std::min({1.0, paper_mm.width() / chart.width_mm, paper_mm.height() / chart.height_mm});
    const double px_per_mm = kResolutionDpi / kMmPerInch;
    {
        QPainter painter;
        if (!painter.begin(&writer)) {
            throw std::runtime_error("cannot start drawing PDF file '" + path.string() + "'");
        }
        // Centre the (possibly shrunk) chart on the paper.
        const double offset_x_mm = (paper_mm.width() - chart.width_mm * shrink) / 2;
        const double offset_y_mm = (paper_mm.height() - chart.height_mm * shrink) / 2;
        painter.translate(offset_x_mm * px_per_mm, offset_y_mm * px_per_mm);
        paintDisplayList(painter, list, chart, px_per_mm * shrink);
        painter.end();
    }
    finishOutputFile(file, path, "PDF");
}

} // namespace atollog::draw
