#pragma once
// The viewer's QApplication: an exception that escapes an event handler (a slot, a paint, a
// key press) becomes a message instead of ending the program. Qt does not let exceptions pass
// through its event loop, and reimplementing notify() is where it says to catch them
// (QCoreApplication::notify). The data is safe either way: every write is one transaction.
#include <QApplication>
#include <QString>

#include <functional>

namespace atollog::view {

class GuardedApplication : public QApplication {
  public:
    GuardedApplication(int &argc, char **argv);

    /// Where caught errors go; by default a critical message box over the active window.
    void setErrorSink(std::function<void(const QString &)> sink) { sink_ = std::move(sink); }
    /// Errors caught so far (tests check it).
    int caughtErrors() const { return caught_; }

    bool notify(QObject *receiver, QEvent *event) override;

  private:
    std::function<void(const QString &)> sink_;
    int caught_ = 0;
    bool reporting_ = false; ///< a message box runs its own loop: no second box from inside it
};

} // namespace atollog::view
