#pragma once
// The figures window: choose a figure (age against depth, range chart, rates, subsidence, line
// of correlation, chain) and its holes, set the age-model options, draw it on a worker thread
// with its phase shown and a Stop button, look at it with the panel's zoom and pan, and export
// it like the panel (SVG, PDF, PNG).
#include "view/figure_request.hpp"

#include <QString>
#include <QStringList>
#include <QWidget>

#include <memory>

class QCheckBox;
class QComboBox;
class QLabel;
class QProgressBar;
class QPushButton;
class QSpinBox;

namespace atollog::view {

class JobControls;
class PanelCanvas;

class FigureWindow : public QWidget {
    Q_OBJECT

  public:
    explicit FigureWindow(QWidget *parent = nullptr);
    ~FigureWindow() override;

    /// The project to draw from and its holes (in the order the chooser lists them).
    void setProject(const QString &path, const QStringList &holes);

    /// The request the controls describe.
    FigureRequest request() const;
    /// Starts drawing the requested figure; false (with the reason in the status line) when a
    /// job is already running or no project is open.
    bool draw();
    /// Asks a running job to stop at its next phase or block of draws.
    void stop();
    /// Writes the figure shown to `path` (format by extension); false after a message.
    bool exportTo(const QString &path);

    bool busy() const;
    PanelCanvas *canvas() const { return canvas_; }
    QComboBox *kindCombo() const { return kind_; }
    QComboBox *holeCombo() const { return hole_; }
    QComboBox *withHoleCombo() const { return with_hole_; }
    QCheckBox *extendBox() const { return extend_; }
    QCheckBox *coreTopOpenBox() const { return core_top_open_; }
    QSpinBox *drawsBox() const { return draws_; }
    QPushButton *drawButton() const;
    QPushButton *stopButton() const;
    QLabel *statusLabel() const;
    QProgressBar *progressBar() const;
    const QString &shownTitle() const { return shown_title_; }

  signals:
    /// A job ended: drawn, failed or stopped (tests wait for it).
    void jobEnded();
    /// A figure stored an age-model run: the panel may show it.
    void modelsStored();

  private:
    void onKindChanged();
    void setStatus(const QString &text, bool error);

    QString project_;
    std::shared_ptr<AgeModelCache> cache_;
    JobControls *controls_ = nullptr;
    QString shown_title_;

    QComboBox *kind_ = nullptr;
    QComboBox *hole_ = nullptr;
    QComboBox *with_hole_ = nullptr;
    QCheckBox *extend_ = nullptr;
    QCheckBox *core_top_open_ = nullptr;
    QSpinBox *draws_ = nullptr;
    QSpinBox *seed_ = nullptr;
    QPushButton *export_button_ = nullptr;
    PanelCanvas *canvas_ = nullptr;
};

} // namespace atollog::view
