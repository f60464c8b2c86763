#include "cli/figure_file.hpp"

#include <algorithm>
#include <cctype>
#include <stdexcept>

namespace atollog::cli {

FigureFormat figureFormatOf(const std::filesystem::path& path, const std::string& option) {
    std::string ext = path.extension().string();
    std::transform(ext.begin(), ext.end(), ext.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    if (ext == ".svg") return FigureFormat::Svg;
    if (ext == ".png") return FigureFormat::Png;
    if (ext == ".pdf") return FigureFormat::Pdf;
    throw std::invalid_argument(option + " '" + path.string() +
                                "': the file name must end in .svg, .png or .pdf");
}

void writeFigure(const draw::DisplayList& list, const std::filesystem::path& path,
                 const std::string& option, const std::string& title, double dpi,
                 draw::PdfPageSize page) {
    switch (figureFormatOf(path, option)) {
    case FigureFormat::Svg: draw::exportSvg(list, path, title); break;
    case FigureFormat::Png: draw::exportPng(list, path, dpi); break;
    case FigureFormat::Pdf: draw::exportPdf(list, path, page, title); break;
    }
}

} // namespace atollog::cli
