#include "draw/output_file.hpp"

#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {
[[noreturn]] void fail(const QFile &file, const std::filesystem::path &path, std::string_view kind,
                       std::string_view verb) {
    throw std::runtime_error("cannot " + std::string(verb) + " " + std::string(kind) + " file '" +
                             path.string() + "': " + file.errorString().toStdString());
}
} // namespace

void openOutputFile(QFile &file, const std::filesystem::path &path, std::string_view kind) {
    file.setFileName(QString::fromStdString(path.string()));
    if (!file.open(QIODevice::WriteOnly | QIODevice::Truncate)) {
        fail(file, path, kind, "create");
    }
}

void finishOutputFile(QFile &file, const std::filesystem::path &path, std::string_view kind) {
    if (file.error() != QFileDevice::NoError) {
        fail(file, path, kind, "write");
    }
    file.close();
    if (file.error() != QFileDevice::NoError) {
        fail(file, path, kind, "write");
    }
}

} // namespace atollog::draw
