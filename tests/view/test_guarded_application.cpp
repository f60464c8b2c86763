// An exception escaping an event handler becomes a message, never a crash: the viewer runs
// under GuardedApplication (the test main does too).
#include "view/guarded_application.hpp"

#include <QCoreApplication>
#include <QEvent>
#include <QTimer>

#include <catch2/catch.hpp>

#include <stdexcept>

namespace {

class ThrowingObject : public QObject {
  public:
    bool event(QEvent *e) override {
        if (e->type() == QEvent::User) throw std::runtime_error("interval base 12.5 m above its top");
        return QObject::event(e);
    }
};

} // namespace

TEST_CASE("An exception from an event handler becomes a message", "[view][bad-input]") {
    auto *app = dynamic_cast<atollog::view::GuardedApplication *>(QCoreApplication::instance());
    REQUIRE(app != nullptr);
    QStringList got;
    app->setErrorSink([&](const QString &text) { got << text; });
    const int before = app->caughtErrors();

    ThrowingObject thrower;
    QEvent event(QEvent::User);
    CHECK_FALSE(QCoreApplication::sendEvent(&thrower, &event));
    // A slot run from the event loop (a timer here) is caught the same way.
    QTimer::singleShot(0, &thrower, [] { throw std::invalid_argument("no hole 'XX1' in the project"); });
    QCoreApplication::processEvents();

    CHECK(app->caughtErrors() == before + 2);
    REQUIRE(got.size() == 2);
    CHECK(got[0].contains("interval base 12.5 m above its top"));
    CHECK(got[1].contains("no hole 'XX1' in the project"));
    CHECK(got[0].contains("holds every edit that was confirmed"));
    app->setErrorSink([](const QString &text) { qWarning("%s", qPrintable(text)); });
}
