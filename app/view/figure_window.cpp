#include "view/figure_window.hpp"

#include "cli/figure_file.hpp"
#include "view/exception_text.hpp"
#include "view/figure_job.hpp"
#include "view/job_controls.hpp"
#include "view/panel_canvas.hpp"

#include <QCheckBox>
#include <QComboBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace atollog::view {
namespace {

/// Age models sample this many draws unless the user asks otherwise (the `age` default).
constexpr int kDefaultDraws = 10000;

} // namespace

FigureWindow::FigureWindow(QWidget *parent)
    : QWidget(parent, Qt::Window), cache_(std::make_shared<AgeModelCache>()) {
    setWindowTitle(tr("Figures - atollog-view"));
    kind_ = new QComboBox(this);
    for (const FigureKind k : figureKinds()) {
        kind_->addItem(QString::fromStdString(figureKindName(k)), static_cast<int>(k));
    }
    hole_ = new QComboBox(this);
    with_hole_ = new QComboBox(this);
    extend_ = new QCheckBox(tr("Ranges extended to 95 %"), this);
    extend_->setToolTip(tr("Widen each pick's bracket to the 95 % confidence interval of its "
                           "range end, and tie the age models to the widened brackets"));
    extend_->setChecked(true);
    core_top_open_ = new QCheckBox(tr("Core top open"), this);
    core_top_open_->setToolTip(tr("The core top is only bounded: no younger than today, no "
                                  "older than the shallowest tie"));
    core_top_open_->setChecked(true);
    draws_ = new QSpinBox(this);
    draws_->setRange(1000, 200000);
    draws_->setSingleStep(1000);
    draws_->setValue(kDefaultDraws);
    seed_ = new QSpinBox(this);
    seed_->setRange(1, 2147483647);
    seed_->setValue(1);

    auto *form = new QFormLayout;
    form->addRow(tr("Figure"), kind_);
    form->addRow(tr("Hole"), hole_);
    form->addRow(tr("Against hole"), with_hole_);
    form->addRow(QString(), extend_);
    form->addRow(QString(), core_top_open_);
    form->addRow(tr("Age-model draws"), draws_);
    form->addRow(tr("Seed"), seed_);

    controls_ = new JobControls(tr("&Draw"), this);
    connect(controls_, &JobControls::jobEnded, this, &FigureWindow::jobEnded);
    export_button_ = new QPushButton(tr("&Export..."), this);
    export_button_->setEnabled(false);

    auto *controls = new QVBoxLayout;
    controls->addLayout(form);
    controls_->addTo(controls, export_button_);
    controls->addStretch(1);
    auto *side = new QWidget(this);
    side->setLayout(controls);
    side->setMaximumWidth(380);

    canvas_ = new PanelCanvas(this);
    auto *layout = new QHBoxLayout(this);
    layout->addWidget(side);
    layout->addWidget(canvas_, 1);
    resize(1200, 760);

    connect(kind_, &QComboBox::currentIndexChanged, this, &FigureWindow::onKindChanged);
    connect(controls_->startButton(), &QPushButton::clicked, this, &FigureWindow::draw);
    connect(export_button_, &QPushButton::clicked, this, [this] {
        const QString path = QFileDialog::getSaveFileName(
            this, tr("Export figure"), QString(), tr("Figures (*.svg *.pdf *.png)"));
        if (!path.isEmpty()) {
            exportTo(path);
        }
    });
    onKindChanged();
}

FigureWindow::~FigureWindow() = default;

void FigureWindow::setProject(const QString &path, const QStringList &holes) {
    project_ = path;
    for (QComboBox *box : {hole_, with_hole_}) {
        const QString kept = box->currentText();
        box->clear();
        box->addItems(holes);
        if (holes.contains(kept)) {
            box->setCurrentText(kept);
        }
    }
    if (with_hole_->count() > 1 && with_hole_->currentIndex() == hole_->currentIndex()) {
        with_hole_->setCurrentIndex(hole_->currentIndex() == 0 ? 1 : 0);
    }
}

FigureRequest FigureWindow::request() const {
    FigureRequest r;
    r.kind = static_cast<FigureKind>(kind_->currentData().toInt());
    r.hole = hole_->currentText().toStdString();
    r.with_hole = with_hole_->currentText().toStdString();
    if (extend_->isChecked()) {
        r.model.biostrat.extend = 0.95;
        r.model.biostrat.ties_extended = true;
    }
    r.model.core_top_open = core_top_open_->isChecked();
    r.model.draws = draws_->value();
    r.model.seed = static_cast<std::uint64_t>(seed_->value());
    return r;
}

void FigureWindow::onKindChanged() {
    const int holes = holesNeeded(static_cast<FigureKind>(kind_->currentData().toInt()));
    hole_->setEnabled(holes >= 1);
    with_hole_->setEnabled(holes == 2);
}

bool FigureWindow::draw() {
    if (project_.isEmpty()) {
        setStatus(tr("Open a project first (File > Open)."), true);
        return false;
    }
    if (controls_->busy()) {
        setStatus(tr("A figure is being drawn: wait for it or stop it first."), true);
        return false;
    }
    auto *job = new FigureJob(project_, request(), cache_);
    connect(job, &FigureJob::finished, this, [this, job] {
        std::optional<FigureResult> result = job->takeResult();
        if (!result) {
            return;
        }
        PanelScene scene;
        scene.list = std::move(result->list);
        canvas_->setScene(std::move(scene));
        canvas_->fitToWindow();
        shown_title_ = QString::fromStdString(result->title);
        setWindowTitle(shown_title_ + tr(" - atollog-view"));
        export_button_->setEnabled(true);
        QString text = tr("Drawn in %1 s.").arg(controls_->elapsedSeconds(), 0, 'f', 1);
        if (!result->models_note.empty()) {
            QString note = QString::fromStdString(result->models_note);
            note[0] = note[0].toUpper();
            text += " " + note + ".";
            if (result->models_note.find("stored as") != std::string::npos) {
                emit modelsStored();
            }
        }
        setStatus(text, false);
    });
    return controls_->run(job, tr("Cannot draw this figure"));
}

void FigureWindow::stop() { controls_->stop(); }

bool FigureWindow::busy() const { return controls_->busy(); }
QPushButton *FigureWindow::drawButton() const { return controls_->startButton(); }
QPushButton *FigureWindow::stopButton() const { return controls_->stopButton(); }
QLabel *FigureWindow::statusLabel() const { return controls_->statusLabel(); }
QProgressBar *FigureWindow::progressBar() const { return controls_->bar(); }

bool FigureWindow::exportTo(const QString &path) {
    try {
        cli::writeFigure(canvas_->scene().list, path.toStdString(), "export file",
                         shown_title_.isEmpty() ? "figure" : shown_title_.toStdString(), 200,
                         draw::PdfPageSize::FitChart);
        setStatus(tr("Exported %1").arg(path), false);
        return true;
    } catch (...) {
        setStatus(tr("Cannot export %1: %2").arg(path, exceptionText()), true);
        return false;
    }
}

void FigureWindow::setStatus(const QString &text, bool error) {
    controls_->setStatus(text, error);
}

} // namespace atollog::view
