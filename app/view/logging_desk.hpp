#pragma once
// The logging desk: the viewer's place for typing a hole's data at the core table. A hole
// chooser and a depth unit (m or ft) on top; the runs of that hole as a table on the left (add
// and remove buttons over it); tabs on the right: the hole's intervals, samples, occurrence grid
// (samples x taxa) and dates, and the project's events and zones, with add / remove row
// buttons acting on the current tab ("Add taxon column" on the grid); undo and redo (Ctrl+Z,
// Ctrl+Shift+Z / Ctrl+Y) over the desk's edits; two lines under the tables: the last refusal
// and the warnings of the last edit.
#include "view/depth_unit.hpp"

#include <QWidget>

#include <string>

class QAction;
class QComboBox;
class QLabel;
class QTabWidget;
class QToolButton;

namespace atollog::view {

class DatesTableModel;
class DeskProject;
class DeskTableModel;
class DeskTableView;
class EventsTableModel;
class HolesTableModel;
class IntervalsTableModel;
class OccurrenceGridModel;
class RunsTableModel;
class SamplesTableModel;
class ZonesTableModel;

class LoggingDesk : public QWidget {
    Q_OBJECT

  public:
    explicit LoggingDesk(QWidget *parent = nullptr);

    /// Opens the project for editing, the first hole chosen; false when it cannot be opened
    /// (the refusal line says why).
    bool openProject(const QString &path);
    /// Chooses a hole by id; false when the project has no such hole.
    bool chooseHole(const QString &hole);
    void setDepthUnit(DepthUnit unit);

    /// Room for about eight rows of each table, so a dock opens with the desk usable.
    QSize sizeHint() const override;

    DeskProject *desk() const { return desk_; }
    RunsTableModel *runsModel() const { return runs_; }
    IntervalsTableModel *intervalsModel() const { return intervals_; }
    SamplesTableModel *samplesModel() const { return samples_; }
    OccurrenceGridModel *occurrencesModel() const { return occurrences_; }
    DatesTableModel *datesModel() const { return dates_; }
    EventsTableModel *eventsModel() const { return events_; }
    ZonesTableModel *zonesModel() const { return zones_; }
    HolesTableModel *holesModel() const { return holes_; }
    DeskTableView *occurrencesView() const { return occurrences_view_; }
    DeskTableView *datesView() const { return dates_view_; }
    DeskTableView *eventsView() const { return events_view_; }
    DeskTableView *zonesView() const { return zones_view_; }
    DeskTableView *holesView() const { return holes_view_; }
    QTabWidget *tabs() const { return tabs_; }
    QAction *addRunAction() const { return add_run_; }
    QAction *removeRunAction() const { return remove_run_; }
    /// Add / remove a row of the current tab's table (intervals: as "Add interval").
    QAction *addRowAction() const { return add_row_; }
    QAction *removeRowAction() const { return remove_row_; }
    QAction *addTaxonAction() const { return add_taxon_; }
    /// Adds the taxon's column to the occurrence grid, shows the grid and opens the current
    /// sample's cell of it for typing; false when the project has no such taxon.
    bool addTaxonColumn(const std::string &taxon);
    DeskTableView *runsView() const { return runs_view_; }
    DeskTableView *intervalsView() const { return intervals_view_; }
    DeskTableView *samplesView() const { return samples_view_; }
    QComboBox *holeCombo() const { return hole_; }
    QComboBox *unitCombo() const { return unit_; }
    QAction *addIntervalAction() const { return add_interval_; }
    QAction *undoAction() const { return undo_; }
    QAction *redoAction() const { return redo_; }
    QLabel *refusalLine() const { return refusal_line_; }
    QLabel *warningLine() const { return warning_line_; }

  signals:
    /// The project file was written (edit, undo, redo): views of the whole project may reload.
    void projectWritten();

  private:
    void fillHoles();
    /// Refills the hole chooser when an edit, undo or redo added, renamed or removed a hole
    /// (or changed a site, which the chooser shows); a renamed hole stays chosen.
    void followHoles();
    /// Gives the runs table the width of its columns (it is narrow; the intervals take the rest).
    void fitRunsWidth();
    void addInterval();
    void addRun();
    void removeRun();
    void addRow();
    void removeRow();
    /// Asks which taxon (a list of the project's taxa without a column) and adds it.
    void chooseTaxonColumn();
    /// The table model behind the current tab, or null for the occurrence grid.
    DeskTableModel *currentTabModel() const;
    DeskTableView *currentTabView() const;
    /// Enables the row actions that apply to the current tab.
    void updateRowActions();
    /// Selects, shows and opens `cell` of `view` for typing.
    static void startTyping(DeskTableView *view, const QModelIndex &cell);
    void showMessage(const QString &message, bool refusal);

    DeskProject *desk_ = nullptr;
    RunsTableModel *runs_ = nullptr;
    IntervalsTableModel *intervals_ = nullptr;
    SamplesTableModel *samples_ = nullptr;
    OccurrenceGridModel *occurrences_ = nullptr;
    DatesTableModel *dates_ = nullptr;
    EventsTableModel *events_ = nullptr;
    ZonesTableModel *zones_ = nullptr;
    HolesTableModel *holes_ = nullptr;
    DeskTableView *runs_view_ = nullptr;
    DeskTableView *intervals_view_ = nullptr;
    DeskTableView *samples_view_ = nullptr;
    DeskTableView *occurrences_view_ = nullptr;
    DeskTableView *dates_view_ = nullptr;
    DeskTableView *events_view_ = nullptr;
    DeskTableView *zones_view_ = nullptr;
    DeskTableView *holes_view_ = nullptr;
    QTabWidget *tabs_ = nullptr; ///< intervals, samples, occurrences, dates, events, zones
    QComboBox *hole_ = nullptr;
    QComboBox *unit_ = nullptr;
    QAction *add_interval_ = nullptr;
    QAction *add_run_ = nullptr;
    QAction *remove_run_ = nullptr;
    QAction *add_row_ = nullptr;
    QAction *remove_row_ = nullptr;
    QAction *add_taxon_ = nullptr;
    QToolButton *add_row_button_ = nullptr;
    QToolButton *remove_row_button_ = nullptr;
    QToolButton *add_taxon_button_ = nullptr;
    QAction *undo_ = nullptr;
    QAction *redo_ = nullptr;
    QLabel *refusal_line_ = nullptr;
    QLabel *warning_line_ = nullptr;
};

} // namespace atollog::view
