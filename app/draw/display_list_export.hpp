#pragma once

#include "draw/display_list.hpp"

#include <filesystem>
#include <string>

namespace atollog::draw {

// Files from a display list, all painted by paintDisplayList over the list's page(). Each needs
// a QGuiApplication (for the bundled font). When a file cannot be opened or written they throw
// std::runtime_error naming the path; bad sizes throw std::invalid_argument.

/// A PNG at `dpi` (white background, 24-bit); pixel size = page mm / 25.4 * dpi, rounded up,
/// and the file records the dpi. Limited to 32767 px a side (a QImage limit).
void exportPng(const DisplayList &list, const std::filesystem::path &path, double dpi);

/// An SVG file (QSvgGenerator writes SVG Tiny 1.2) whose width and height are the page in mm;
/// `title` becomes its <title>. Text stays text (<text> elements in DejaVu Sans), so it can be
/// searched and edited.
void exportSvg(const DisplayList &list, const std::filesystem::path &path,
               const std::string &title);

enum class PdfPageSize {
    FitChart, // one page exactly the size of the chart
    A4,
    A3,
    Letter,
};

/// A one-page PDF. On a paper size the chart is centred, turned to landscape when it is wider
/// than tall, and shrunk to fit when too large (never enlarged).
void exportPdf(const DisplayList &list, const std::filesystem::path &path, PdfPageSize page,
               const std::string &title = {});

} // namespace atollog::draw
