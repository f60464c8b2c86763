#pragma once

#include <QFile>

#include <filesystem>
#include <string_view>

namespace atollog::draw {

/// Opens `file` on `path` for writing (truncating); throws std::runtime_error naming the kind
/// of file, the path and the system's reason when it cannot.
void openOutputFile(QFile &file, const std::filesystem::path &path, std::string_view kind);

/// Throws std::runtime_error naming the path when writing to `file` failed at any point.
void finishOutputFile(QFile &file, const std::filesystem::path &path, std::string_view kind);

} // namespace atollog::draw
