#pragma once
// The viewer's window: the panel canvas in the middle, the side pane in a dock, menus for
// opening, exporting and looking. Every change of what is shown or how rebuilds the panel's
// input and view from the full project panel and lays it out again; any exception from loading
// or layout becomes a message, never a crash.
#include "draw/display_list_export.hpp"
#include "draw/panel_input.hpp"
#include "view/message_sink.hpp"
#include "view/panel_choice.hpp"

#include <QMainWindow>

class QAction;
class QComboBox;
class QLabel;
class QMenu;
class QTimer;

namespace atollog::view {

class AnalysisWindow;
class FigureWindow;
class LoggingDesk;
class PanelCanvas;
class SidePane;

class MainWindow : public QMainWindow {
    Q_OBJECT

  public:
    explicit MainWindow(QWidget *parent = nullptr);

    /// Loads a project file and shows its panel; false (after a message) when it cannot.
    bool openProject(const QString &path);
    /// Shows a panel's full content with this choice and fits it to the window.
    void showPanel(draw::PanelInput full, const PanelChoice &choice);
    /// Writes the panel as shown (same view, same vertical scale) to `path`, the format from its
    /// extension; false (after a message) when it cannot.
    bool exportTo(const QString &path, draw::PdfPageSize page, double png_dpi);

    void setMessageSink(MessageSink sink) { sink_ = std::move(sink); }

    PanelCanvas *canvas() const { return canvas_; }
    SidePane *sidePane() const { return side_; }
    LoggingDesk *loggingDesk() const { return desk_; }
    /// File actions without their dialogs (main_window_files.cpp); each reports a failure
    /// through the message sink and returns false, leaving the project as it was.
    /// A new, empty project at `path` (which must not exist), opened.
    bool createProject(const QString &path);
    /// Reads a core data folder into the open project (all or nothing) and shows the result;
    /// a project that holds data is refused unless `replace`.
    bool importFolder(const QString &folder, bool replace);
    /// Writes the open project as a core data folder; a non-empty folder needs `overwrite`.
    bool exportFolder(const QString &folder, bool overwrite);
    const QString &projectPath() const { return project_path_; }

    /// The figures window (age-depth, rates, subsidence, ...) of the open project, shown.
    FigureWindow *showFigures();
    /// The analyses window (datum picks, zones, composite sequence) of the open project, shown.
    AnalysisWindow *showAnalyses();
    /// Paths of the projects opened lately, newest first (at most kRecentProjects).
    static QStringList recentProjects();
    static constexpr int kRecentProjects = 8;
    QComboBox *flattenCombo() const { return flatten_; }
    QComboBox *scaleCombo() const { return scale_; }
    QAction *depthAction() const { return depth_; }
    QAction *elevationAction() const { return elevation_; }
    QAction *ageAction() const { return age_; }
    const draw::PanelInput &shownInput() const { return shown_; }
    const draw::PanelView &panelView() const { return view_; }

  protected:
    void closeEvent(QCloseEvent *event) override;

  private:
    void buildMenus();
    void refreshRecentMenu();
    void rememberProject(const QString &path);
    /// Loads the project's panel; `keep_choice` keeps what is ticked and the zoom (a reload
    /// after an edit on the logging desk).
    bool showProjectPanel(const QString &path, bool keep_choice);
    void buildToolBar();
    void relayout();
    void refreshFlattenChoices();
    void chooseAndOpen();
    void chooseAndCreate();
    void chooseAndImport();
    void chooseAndExportFolder();
    /// Shows an open project that holds no data yet: no panel, the desk open.
    void showEmptyProject(const QString &path);
    void chooseAndExport();
    void onItemSelected(draw::ItemRole role, const QString &key);
    void onColumnOrderChanged(const QList<int> &order);
    void report(const QString &title, const QString &text);

    PanelCanvas *canvas_ = nullptr;
    SidePane *side_ = nullptr;
    LoggingDesk *desk_ = nullptr;
    FigureWindow *figures_ = nullptr; ///< made on first use
    AnalysisWindow *analyses_ = nullptr; ///< made on first use
    QMenu *recent_menu_ = nullptr;
    QTimer *panel_reload_ = nullptr; ///< one panel reload after a burst of desk edits
    QComboBox *flatten_ = nullptr;
    QComboBox *scale_ = nullptr;
    QAction *depth_ = nullptr;
    QAction *elevation_ = nullptr;
    QAction *age_ = nullptr;
    QLabel *readout_ = nullptr;
    MessageSink sink_;

    draw::PanelInput full_;  ///< everything the project offers
    draw::PanelInput shown_; ///< as chosen in the side pane, what was laid out
    draw::PanelView view_;
    QString project_path_;
};

} // namespace atollog::view
