#pragma once
// Drawing needs a QGuiApplication (fonts, paint engines) even when nothing is shown.

namespace atollog::cli {

/// Makes sure a Qt GUI application object exists, on the offscreen platform unless the user's
/// QT_QPA_PLATFORM says otherwise, so the command line draws on machines without a display.
void ensureGuiApplication();

} // namespace atollog::cli
