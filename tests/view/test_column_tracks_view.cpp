// The viewer's side of the column data tracks: their words in tooltips and details, the track
// check boxes and the taxon list in the side pane, on the invented three-hole panel.
#include "canvas_fixture.hpp"

#include "view/item_description.hpp"
#include "view/main_window.hpp"
#include "view/selection_details.hpp"
#include "view/side_pane.hpp"

#include <QCheckBox>
#include <QListWidget>

using namespace atollog;
using namespace atollog::view;
using namespace atollog::view::test;

namespace {

/// The sample panel with two taxon lanes, a zone, a date and an age model in every column.
draw::PanelInput panelWithTracks() {
    draw::PanelInput in = samplePanel();
    for (draw::HoleColumnInput &c : in.columns) {
        c.taxa = {{"TX-A", "Taxonella alpha", "coral", {3.5, 6.0, 8.5}, {1.0}, {}},
                  {"TX-B", "Taxonella beta", "nannofossil", {13.5, 16.0}, {}, {18.5}}};
        c.zones = {{"AX scheme", "AZ1", {5.0, 6.0, false}, {20.0, 22.0, false}}};
        c.dates = {{"u-th " + c.hole + "-S4", "u-th", 8.0, 8.5, 0.12, 0.11, 0.13, true}};
        c.age_model.rows = {{0.0, 0.0, 0.0, 0.01}, {10.0, 0.10, 0.14, 0.18},
                            {20.0, 0.30, 0.40, 0.50}};
    }
    return in;
}

std::size_t countRole(const draw::DisplayList &list, draw::ItemRole role,
                      const std::string &key = {}) {
    std::size_t n = 0;
    for (const draw::DisplayItem *item : list.withRole(role)) {
        n += key.empty() || draw::itemTag(*item).key == key;
    }
    return n;
}

} // namespace

TEST_CASE("track items are described with their data", "[view][tracks]") {
    const draw::PanelInput in = panelWithTracks();
    const QString taxon =
        describeTrackItem(in, {draw::ItemRole::ColumnTaxonBar, "TX-A"}, std::size_t{1}, 7.0);
    CHECK(taxon.contains(QStringLiteral("taxon TX-A")));
    CHECK(taxon.contains(QStringLiteral("AX2: 3 counted finds at 3.50, 6.00, 8.50 m")));
    CHECK(taxon.contains(QStringLiteral("reworked at 1.00 m")));
    CHECK_FALSE(taxon.contains(QStringLiteral("AX1"))); // only the column under the cursor

    const QString zone = describeTrackItem(in, {draw::ItemRole::ColumnZone, "AZ1"}, {}, {});
    CHECK(zone.contains(QStringLiteral("AX1 (AX scheme): top 5.00-6.00 m, base 20.00-22.00 m")));
    CHECK(zone.contains(QStringLiteral("AX3 (AX scheme)"))); // no column: every hole

    const QString date =
        describeTrackItem(in, {draw::ItemRole::ColumnDateMarker, "u-th AX1-S4"}, {}, {});
    CHECK(date.contains(QStringLiteral("AX1: u-th, 0.12 Ma (95 %: 0.11 Ma-0.13 Ma) at 8.00-8.50 m")));

    // Halfway between the rows at 10 and 20 m: the quantiles halfway between theirs.
    const QString model =
        describeTrackItem(in, {draw::ItemRole::ColumnAgeModel, "median"}, std::size_t{0}, 15.0);
    CHECK(model.contains(QStringLiteral("AX1 at 15.00 m: median 0.27 Ma, 95 %: 0.2 Ma-0.34 Ma")));
    const QString outside =
        describeTrackItem(in, {draw::ItemRole::ColumnAgeModel, "band"}, std::size_t{0}, 30.0);
    CHECK(outside.contains(QStringLiteral("outside the age model")));
    // Other roles are not track items.
    CHECK(describeTrackItem(in, {draw::ItemRole::TieLine, "B ALPHA"}, {}, {}).isEmpty());
    // A click lists the item's data in the details pane.
    CHECK(selectionDetails(in, draw::ItemRole::ColumnZoneName, QStringLiteral("AZ1"))
              .contains(QStringLiteral("base 20.00-22.00 m")));
}

TEST_CASE("the side pane chooses the tracks and the taxon lanes", "[view][tracks][window]") {
    MainWindow window;
    QStringList messages;
    window.setMessageSink([&](const QString &, const QString &text) { messages << text; });
    window.resize(1200, 800);
    const draw::PanelInput full = panelWithTracks();
    window.showPanel(full, showEverything(full));
    SidePane *side = window.sidePane();
    for (const char *word : {"runs", "lithology", "surfaces", "samples", "taxa", "zones", "dates",
                             "model"}) {
        REQUIRE(side->trackBox(QLatin1String(word)) != nullptr);
        side->trackBox(QLatin1String(word))->setChecked(true);
    }
    const auto list = [&] { return window.canvas()->scene().list; };
    // No taxon ticked at first: no lanes; the rest of the tracks are drawn.
    REQUIRE(side->taxonList()->count() == 2);
    CHECK(countRole(list(), draw::ItemRole::ColumnTaxonBar) == 0);
    CHECK(countRole(list(), draw::ItemRole::ColumnZone, "AZ1") > 0);
    CHECK(countRole(list(), draw::ItemRole::ColumnAgeModel, "median") == 3);
    CHECK(countRole(list(), draw::ItemRole::ColumnDateMarker) == 3);

    side->taxonList()->item(1)->setCheckState(Qt::Checked); // Taxonella beta
    CHECK(countRole(list(), draw::ItemRole::ColumnTaxonBar, "TX-B") == 3);
    CHECK(countRole(list(), draw::ItemRole::ColumnTaxonBar, "TX-A") == 0);
    CHECK(window.shownInput().columns[0].taxa.size() == 1);

    side->trackBox(QStringLiteral("model"))->setChecked(false);
    CHECK(countRole(list(), draw::ItemRole::ColumnAgeModel) == 0);
    CHECK(countRole(list(), draw::ItemRole::ColumnDateMarker) == 3); // dates keep the track
    side->trackBox(QStringLiteral("taxa"))->setChecked(false);
    CHECK(countRole(list(), draw::ItemRole::ColumnTaxonBar) == 0);
    side->trackBox(QStringLiteral("samples"))->setChecked(false);
    CHECK(countRole(list(), draw::ItemRole::SampleTick) == 0);
    CHECK_FALSE(side->tracks().samples);
    CHECK(messages.isEmpty());
}
