#include "draw/bundled_font.hpp"

#include <QFontDatabase>
#include <QGuiApplication>

#include <mutex>
#include <stdexcept>

namespace atollog::draw {

namespace {

// Resource paths set by qt_add_resources in app/CMakeLists.txt (prefix /atollog/fonts).
constexpr const char *kRegularPath = ":/atollog/fonts/DejaVuSans.ttf";
constexpr const char *kBoldPath = ":/atollog/fonts/DejaVuSans-Bold.ttf";

QString registerFont(const char *path) {
    const int id = QFontDatabase::addApplicationFont(QString::fromLatin1(path));
    const QStringList families = QFontDatabase::applicationFontFamilies(id);
    if (id < 0 || families.isEmpty()) {
        throw std::runtime_error(std::string("cannot load the bundled font ") + path);
    }
    return families.front();
}

} // namespace

QString bundledFontFamily() {
    if (QGuiApplication::instance() == nullptr) {
        throw std::runtime_error(
            "drawing text needs a QGuiApplication (create one before painting or exporting; "
            "headless: QT_QPA_PLATFORM=offscreen)");
    }
    static std::once_flag once;
    static QString family;
    std::call_once(once, [] {
        family = registerFont(kRegularPath);
        registerFont(kBoldPath);
    });
    return family;
}

} // namespace atollog::draw
