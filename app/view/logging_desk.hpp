#pragma once
// The logging desk: the viewer's place for typing a hole's core runs and lithology intervals at
// the core table. A hole chooser and a depth unit (m or ft) on top, the runs of that hole as a
// table on the left, its intervals and samples as two tabs on the right, an "Add interval" action that continues the log below the
// deepest interval, undo and redo (Ctrl+Z, Ctrl+Shift+Z / Ctrl+Y) over the desk's edits, and
// two lines under the tables: the last refusal and the warnings of the last edit.
#include "view/depth_unit.hpp"

#include <QWidget>

class QAction;
class QComboBox;
class QLabel;
class QTabWidget;

namespace atollog::view {

class DeskProject;
class DeskTableView;
class IntervalsTableModel;
class RunsTableModel;
class SamplesTableModel;

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
    /// Gives the runs table the width of its columns (it is narrow; the intervals take the rest).
    void fitRunsWidth();
    void addInterval();
    void showMessage(const QString &message, bool refusal);

    DeskProject *desk_ = nullptr;
    RunsTableModel *runs_ = nullptr;
    IntervalsTableModel *intervals_ = nullptr;
    SamplesTableModel *samples_ = nullptr;
    DeskTableView *runs_view_ = nullptr;
    DeskTableView *intervals_view_ = nullptr;
    DeskTableView *samples_view_ = nullptr;
    QTabWidget *tabs_ = nullptr; ///< intervals, samples
    QComboBox *hole_ = nullptr;
    QComboBox *unit_ = nullptr;
    QAction *add_interval_ = nullptr;
    QAction *undo_ = nullptr;
    QAction *redo_ = nullptr;
    QLabel *refusal_line_ = nullptr;
    QLabel *warning_line_ = nullptr;
};

} // namespace atollog::view
