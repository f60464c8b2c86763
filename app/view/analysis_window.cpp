#include "view/analysis_window.hpp"

#include "view/analysis_job.hpp"
#include "view/job_controls.hpp"
#include "view/analysis_result_model.hpp"
#include "view/exception_text.hpp"

#include <QCheckBox>
#include <QComboBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QSaveFile>
#include <QSpinBox>
#include <QTableView>
#include <QThread>
#include <QVBoxLayout>

#include <algorithm>
#include <memory>

namespace atollog::view {
namespace {

/// The sentence form of a note: a capital first letter and a full stop.
QString sentence(const std::string &text) {
    QString s = QString::fromStdString(text);
    if (!s.isEmpty()) {
        s[0] = s[0].toUpper();
        s += QLatin1Char('.');
    }
    return s;
}

} // namespace

AnalysisWindow::AnalysisWindow(QWidget *parent) : QWidget(parent, Qt::Window) {
    setWindowTitle(tr("Analyses - atollog-view"));
    const cli::SequenceOptions defaults; // the `sequence` command's defaults

    kind_ = new QComboBox(this);
    for (const AnalysisKind k : analysisKinds()) {
        kind_->addItem(QString::fromStdString(analysisKindName(k)), static_cast<int>(k));
    }
    hole_ = new QComboBox(this);
    hole_->setToolTip(tr("Datum picks and zones of this hole only"));
    table_ = new QComboBox(this);
    extend_ = new QCheckBox(tr("Ranges extended to 95 %"), this);
    extend_->setToolTip(tr("Also give each pick the 95 % confidence interval of its range end "
                           "(as --extend 0.95)"));
    all_events_ = new QCheckBox(tr("Also events not found"), this);
    all_events_->setToolTip(tr("List the time-scale events whose taxon is not found in a hole"));

    unit_ = new QComboBox(this);
    unit_->addItem(tr("metres moved"), QStringLiteral("metres"));
    unit_->addItem(tr("sampled levels crossed"), QStringLiteral("levels"));
    unit_->addItem(tr("order inversions"), QStringLiteral("inversions"));
    seed_ = new QSpinBox(this);
    seed_->setRange(0, 2147483647);
    seed_->setValue(static_cast<int>(defaults.seed));
    seed_->setToolTip(tr("The same seed gives the same order"));
    restarts_ = new QSpinBox(this);
    restarts_->setRange(1, 1000);
    restarts_->setValue(defaults.restarts);
    restarts_->setToolTip(tr("Independent annealing runs; the best is kept"));
    moves_ = new QSpinBox(this);
    moves_->setRange(1, 1000000000);
    moves_->setSingleStep(50000);
    moves_->setGroupSeparatorShown(true);
    moves_->setValue(static_cast<int>(defaults.moves));
    moves_->setToolTip(tr("Moves per annealing run"));

    auto *form = new QFormLayout;
    form->addRow(tr("Analysis"), kind_);
    form->addRow(tr("Hole"), hole_);
    form->addRow(tr("Table"), table_);
    form->addRow(QString(), extend_);
    form->addRow(QString(), all_events_);
    sequence_box_ = new QGroupBox(tr("Sequence search"), this);
    auto *sequence_form = new QFormLayout(sequence_box_);
    sequence_form->addRow(tr("Misfit in"), unit_);
    sequence_form->addRow(tr("Seed"), seed_);
    sequence_form->addRow(tr("Restarts"), restarts_);
    sequence_form->addRow(tr("Moves per restart"), moves_);

    controls_ = new JobControls(tr("&Run"), this);
    connect(controls_, &JobControls::jobEnded, this, &AnalysisWindow::jobEnded);

    auto *controls = new QVBoxLayout;
    controls->addLayout(form);
    controls->addWidget(sequence_box_);
    controls_->addTo(controls);
    controls->addStretch(1);
    auto *side = new QWidget(this);
    side->setLayout(controls);
    side->setFixedWidth(340);

    title_ = new QLabel(this);
    QFont bold = title_->font();
    bold.setBold(true);
    title_->setFont(bold);
    provenance_ = new QLabel(this);
    provenance_->setWordWrap(true);
    provenance_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    export_button_ = new QPushButton(tr("Export &CSV..."), this);
    export_button_->setEnabled(false);
    model_ = new AnalysisResultModel(this);
    view_ = new QTableView(this);
    view_->setModel(model_);
    view_->setAlternatingRowColors(true);
    view_->setSelectionBehavior(QAbstractItemView::SelectRows);
    view_->setEditTriggers(QAbstractItemView::NoEditTriggers);
    view_->verticalHeader()->setDefaultSectionSize(view_->fontMetrics().height() + 6);
    auto *heading = new QHBoxLayout;
    heading->addWidget(title_, 1);
    heading->addWidget(export_button_);
    auto *results = new QVBoxLayout;
    results->addLayout(heading);
    results->addWidget(provenance_);
    results->addWidget(view_, 1);

    auto *layout = new QHBoxLayout(this);
    layout->addWidget(side);
    layout->addLayout(results, 1);
    resize(1200, 700);

    connect(kind_, &QComboBox::currentIndexChanged, this, &AnalysisWindow::onKindChanged);
    connect(controls_->startButton(), &QPushButton::clicked, this, &AnalysisWindow::run);
    connect(export_button_, &QPushButton::clicked, this, [this] {
        const QString path = QFileDialog::getSaveFileName(this, tr("Export table as CSV"),
                                                          QString(), tr("CSV files (*.csv)"));
        if (!path.isEmpty()) {
            exportCsv(path);
        }
    });
    setProject(QString(), {});
    onKindChanged();
}

AnalysisWindow::~AnalysisWindow() = default;

void AnalysisWindow::setProject(const QString &path, const QStringList &holes) {
    project_ = path;
    const QString kept = hole_->currentData().toString();
    hole_->clear();
    hole_->addItem(tr("All holes"), QString());
    for (const QString &h : holes) {
        hole_->addItem(h, h);
    }
    const int again = hole_->findData(kept);
    hole_->setCurrentIndex(again >= 0 ? again : 0);
}

AnalysisRequest AnalysisWindow::request() const {
    AnalysisRequest r;
    r.kind = static_cast<AnalysisKind>(kind_->currentData().toInt());
    r.hole = hole_->currentData().toString().toStdString();
    r.all_events = all_events_->isChecked();
    r.table = table_->currentData().toString().toStdString();
    if (extend_->isChecked()) {
        r.biostrat.extend = 0.95;
        r.sequence.correlation.biostrat.extend = 0.95;
    }
    r.sequence.unit = unit_->currentData().toString().toStdString();
    r.sequence.seed = static_cast<std::uint64_t>(seed_->value());
    r.sequence.restarts = restarts_->value();
    r.sequence.moves = moves_->value();
    // Restarts run in parallel on up to four threads; the result never depends on it.
    r.sequence.threads = std::clamp(QThread::idealThreadCount(), 1, 4);
    return r;
}

void AnalysisWindow::onKindChanged() {
    const auto kind = static_cast<AnalysisKind>(kind_->currentData().toInt());
    table_->clear();
    for (const AnalysisTableChoice &t : analysisTables(kind)) {
        table_->addItem(QString::fromStdString(t.name), QString::fromStdString(t.by));
    }
    table_->setEnabled(table_->count() > 1);
    const bool sequence = kind == AnalysisKind::CompositeSequence;
    hole_->setEnabled(!sequence); // the sequence orders the events of every hole at once
    all_events_->setEnabled(kind == AnalysisKind::DatumPicks);
    sequence_box_->setEnabled(sequence);
}

bool AnalysisWindow::run() {
    if (project_.isEmpty()) {
        setStatus(tr("Open a project first (File > Open)."), true);
        return false;
    }
    if (controls_->busy()) {
        setStatus(tr("An analysis is running: wait for it or stop it first."), true);
        return false;
    }
    auto *job = new AnalysisJob(project_, request());
    connect(job, &AnalysisJob::finished, this, [this, job] {
        std::optional<AnalysisResult> result = job->takeResult();
        if (!result) {
            return;
        }
        title_->setText(QString::fromStdString(result->title));
        provenance_->setText(sentence(result->provenance) + QLatin1Char(' ') +
                             sentence(result->summary));
        model_->setTable(result->shown);
        view_->resizeColumnsToContents();
        shown_ = std::move(result);
        export_button_->setEnabled(true);
        setStatus(tr("Done in %1 s.").arg(controls_->elapsedSeconds(), 0, 'f', 1), false);
    });
    return controls_->run(job, tr("Cannot run this analysis"));
}

void AnalysisWindow::stop() { controls_->stop(); }

bool AnalysisWindow::busy() const { return controls_->busy(); }
QPushButton *AnalysisWindow::runButton() const { return controls_->startButton(); }
QPushButton *AnalysisWindow::stopButton() const { return controls_->stopButton(); }
QProgressBar *AnalysisWindow::progressBar() const { return controls_->bar(); }
QLabel *AnalysisWindow::statusLabel() const { return controls_->statusLabel(); }

bool AnalysisWindow::exportCsv(const QString &path) {
    if (!shown_) {
        setStatus(tr("Run an analysis first: there is no table to export."), true);
        return false;
    }
    try {
        const std::string csv = analysisCsv(*shown_);
        // All or nothing: QSaveFile writes beside the target and renames it into place.
        QSaveFile file(path);
        if (!file.open(QIODevice::WriteOnly) ||
            file.write(csv.data(), static_cast<qint64>(csv.size())) !=
                static_cast<qint64>(csv.size()) ||
            !file.commit()) {
            setStatus(tr("Cannot write %1: %2").arg(path, file.errorString()), true);
            return false;
        }
        setStatus(tr("Exported %1").arg(path), false);
        return true;
    } catch (...) {
        setStatus(tr("Cannot export %1: %2").arg(path, exceptionText()), true);
        return false;
    }
}

void AnalysisWindow::setStatus(const QString &text, bool error) {
    controls_->setStatus(text, error);
}

} // namespace atollog::view
