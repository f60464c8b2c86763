#pragma once
// Where the window's error messages go. A modal box by default; tests put in a recorder, so an
// error never blocks a test run waiting for a click.
#include <QString>

#include <functional>

namespace atollog::view {

using MessageSink = std::function<void(const QString &title, const QString &text)>;

} // namespace atollog::view
