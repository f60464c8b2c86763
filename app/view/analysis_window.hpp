#pragma once
// The analyses window: choose datum picks, zones or the composite sequence and their options
// (the commands' options that shape the result, with the commands' defaults), run it on a
// worker thread with its phase, a bar while the sequence anneals and a Stop button, and read
// the result as a table with its provenance line; export the table as the command's CSV.
#include "view/analysis_request.hpp"

#include <QString>
#include <QStringList>
#include <QWidget>

#include <optional>

class QCheckBox;
class QComboBox;
class QLabel;
class QProgressBar;
class QPushButton;
class QSpinBox;
class QTableView;

namespace atollog::view {

class JobControls;
class AnalysisResultModel;

class AnalysisWindow : public QWidget {
    Q_OBJECT

  public:
    explicit AnalysisWindow(QWidget *parent = nullptr);
    ~AnalysisWindow() override;

    /// The project to analyse and its holes (the hole filter lists them after "All holes").
    void setProject(const QString &path, const QStringList &holes);

    /// The request the controls describe.
    AnalysisRequest request() const;
    /// Starts the requested analysis; false (with the reason in the status line) when one is
    /// already running or no project is open.
    bool run();
    /// Asks a running analysis to stop at its next phase or block of moves.
    void stop();
    /// Writes the shown result's table as `atollog <command> --csv` prints it; false after a
    /// message in the status line.
    bool exportCsv(const QString &path);

    bool busy() const;
    QComboBox *kindCombo() const { return kind_; }
    QComboBox *holeCombo() const { return hole_; }
    QComboBox *tableCombo() const { return table_; }
    QComboBox *unitCombo() const { return unit_; }
    QCheckBox *extendBox() const { return extend_; }
    QCheckBox *allEventsBox() const { return all_events_; }
    QSpinBox *seedBox() const { return seed_; }
    QSpinBox *restartsBox() const { return restarts_; }
    QSpinBox *movesBox() const { return moves_; }
    QPushButton *runButton() const;
    QPushButton *stopButton() const;
    QPushButton *exportButton() const { return export_button_; }
    QProgressBar *progressBar() const;
    QLabel *statusLabel() const;
    QLabel *provenanceLabel() const { return provenance_; }
    QTableView *tableView() const { return view_; }
    AnalysisResultModel *resultModel() const { return model_; }

  signals:
    /// A run ended: shown, failed or stopped (tests wait for it).
    void jobEnded();

  private:
    void onKindChanged();
    void setStatus(const QString &text, bool error);

    QString project_;
    JobControls *controls_ = nullptr;
    std::optional<AnalysisResult> shown_;

    QComboBox *kind_ = nullptr;
    QComboBox *hole_ = nullptr;
    QComboBox *table_ = nullptr;
    QCheckBox *extend_ = nullptr;
    QCheckBox *all_events_ = nullptr;
    QComboBox *unit_ = nullptr;
    QSpinBox *seed_ = nullptr;
    QSpinBox *restarts_ = nullptr;
    QSpinBox *moves_ = nullptr;
    QWidget *sequence_box_ = nullptr;
    QPushButton *export_button_ = nullptr;
    QLabel *title_ = nullptr;
    QLabel *provenance_ = nullptr;
    QTableView *view_ = nullptr;
    AnalysisResultModel *model_ = nullptr;
};

} // namespace atollog::view
