#pragma once
// Writing a drawing to the file a user names: the format follows the extension.
#include "draw/display_list.hpp"
#include "draw/display_list_export.hpp"

#include <filesystem>
#include <string>

namespace atollog::cli {

enum class FigureFormat { Svg, Png, Pdf };

/// The format of `path` by its extension (any case); throws std::invalid_argument naming
/// `option` (e.g. "--out") when it is not .svg, .png or .pdf.
FigureFormat figureFormatOf(const std::filesystem::path& path, const std::string& option);

/// Writes `list` to `path` in the format of its extension (a PNG at `dpi`, a PDF on `page`).
void writeFigure(const draw::DisplayList& list, const std::filesystem::path& path,
                 const std::string& option, const std::string& title, double dpi,
                 draw::PdfPageSize page);

} // namespace atollog::cli
