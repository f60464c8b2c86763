#pragma once
// The message of the exception being handled, for the viewer's messages. Call it only inside a
// catch block: it rethrows the current exception to read it.
#include <QString>

namespace atollog::view {

QString exceptionText();

} // namespace atollog::view
