#include "view/exception_text.hpp"

#include <QObject>

#include <exception>

namespace atollog::view {

QString exceptionText() {
    try {
        throw;
    } catch (const std::exception &e) {
        return QString::fromStdString(e.what());
    } catch (...) {
        return QObject::tr("an unknown error");
    }
}

} // namespace atollog::view
