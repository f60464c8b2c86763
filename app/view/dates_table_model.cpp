#include "view/dates_table_model.hpp"

#include "view/desk_project.hpp"
#include "view/value_with_sd.hpp"
#include "view/word_choice_delegate.hpp"

#include <algorithm>

namespace atollog::view {

namespace {

// The folder's column names, for undo labels and header tooltips.
const char *const kFieldNames[] = {
    "sample", "depth_m", "method", "age_ma", "age_sd_ma",
    "th230_u238_act, th230_u238_act_sd, u234_u238_act, u234_u238_act_sd", "th232_ppb",
    "u238_ppb", "f14c, f14c_sd", "delta_r_yr, delta_r_sd_yr"};

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }

QString optionalText(const std::optional<double> &v) { return v ? exactNumberText(*v) : QString(); }

} // namespace

DatesTableModel::DatesTableModel(DeskProject &desk, QObject *parent) : DeskRows(desk, parent) {}

QString DatesTableModel::columnTitle(int column) const {
    switch (column) {
    case SampleId: return tr("Sample");
    case Depth: return tr("Depth (%1)").arg(unitSymbol(depthUnit()));
    case Method: return tr("Method");
    case Age: return tr("Age (Ma)");
    case AgeSd: return tr("Age sd (Ma)");
    case UThRatios: return tr("²³⁰Th/²³⁸U ± sd; ²³⁴U/²³⁸U ± sd (activity)");
    case Th232: return tr("²³²Th (ppb)");
    case U238: return tr("²³⁸U (ppb)");
    case F14C: return tr("F¹⁴C ± sd");
    case DeltaR: return tr("ΔR ± sd (yr)");
    default: return {};
    }
}

QString DatesTableModel::columnTip(int column) const {
    switch (column) {
    case SampleId: return tr("The dated sample of this hole; or clear it and give the depth");
    case Depth: return tr("The dated depth when no sample is given");
    case Method: return tr("One of: %1").arg(word(allowedWords<DateMethod>()));
    case UThRatios:
        return tr("Both activity ratios with their one-sd uncertainties, e.g. "
                  "'0.0123 ± 0.0002; 1.145 ± 0.003'; clear to remove the measurement. "
                  "Stored as %1")
            .arg(QLatin1String(kFieldNames[column]));
    case F14C:
        return tr("Fraction modern with its one sd, e.g. '0.77094 ± 0.00251'; clear to "
                  "remove the measurement");
    case DeltaR: return tr("Local marine reservoir offset with its one sd, years; optional");
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QVariant DatesTableModel::data(const QModelIndex &index, int role) const {
    if (role != kWordChoicesRole) {
        return DeskTableModel::data(index, role);
    }
    if (index.column() == Method) {
        QStringList words;
        for (const DateMethod m : allValues<DateMethod>()) {
            words << word(toString(m));
        }
        return words;
    }
    if (index.column() == SampleId) {
        QStringList words{QString()};
        for (const Sample &s : desk().data().samples) {
            if (s.hole == hole()) {
                words << QString::fromStdString(s.sample);
            }
        }
        return words;
    }
    return {};
}

QString DatesTableModel::cellText(int r, int column) const {
    const NumericalDate &d = dateAt(r);
    switch (column) {
    case SampleId: return d.sample ? QString::fromStdString(*d.sample) : QString();
    case Depth: return d.depth_m ? depthText(*d.depth_m, depthUnit()) : QString();
    case Method: return word(toString(d.method));
    case Age: return optionalText(d.age_ma);
    case AgeSd: return optionalText(d.age_sd_ma);
    case UThRatios:
        return d.uth ? QStringLiteral("%1; %2").arg(
                           valueWithSdText(d.uth->th230_u238_act, d.uth->th230_u238_act_sd),
                           valueWithSdText(d.uth->u234_u238_act, d.uth->u234_u238_act_sd))
                     : QString();
    case Th232: return d.uth ? optionalText(d.uth->th232_ppb) : QString();
    case U238: return d.uth ? optionalText(d.uth->u238_ppb) : QString();
    case F14C: return d.c14 ? valueWithSdText(d.c14->f14c, d.c14->f14c_sd) : QString();
    case DeltaR:
        if (d.c14 && d.c14->delta_r_yr) {
            return d.c14->delta_r_sd_yr ? valueWithSdText(*d.c14->delta_r_yr, *d.c14->delta_r_sd_yr)
                                        : exactNumberText(*d.c14->delta_r_yr);
        }
        return {};
    default: return {};
    }
}

DeskTableModel::TypedRow DatesTableModel::typed(int r, int column, const QString &text) const {
    NumericalDate d = dateAt(r);
    const QString where = tr("dates: %1: %2").arg(rowName(r), columnTitle(column));
    auto optionalNumber = [&](std::optional<double> &out) -> std::optional<QString> {
        if (text.isEmpty()) {
            out.reset();
            return std::nullopt;
        }
        const auto n = readNumber(text);
        if (!n) {
            return tr("%1: '%2' is not a number; type a number, or clear the field").arg(where, text);
        }
        out = *n;
        return std::nullopt;
    };
    auto notPair = [&](const QString &example) {
        return tr("%1: '%2' is not a value with its sd; type it as %3, or clear the field")
            .arg(where, text, example);
    };
    std::optional<QString> bad;
    switch (column) {
    case SampleId:
        if (text.isEmpty()) d.sample.reset();
        else d.sample = text.toStdString();
        break;
    case Depth: {
        bad = optionalNumber(d.depth_m);
        if (!bad && d.depth_m) d.depth_m = depthInMetres(*d.depth_m, depthUnit());
        break;
    }
    case Method:
        if (const auto m = parseDateMethod(text.toLower().toStdString())) d.method = *m;
        else bad = tr("%1: '%2' is not a known method; type one of %3")
                       .arg(where, text, word(allowedWords<DateMethod>()));
        break;
    case Age: bad = optionalNumber(d.age_ma); break;
    case AgeSd: bad = optionalNumber(d.age_sd_ma); break;
    case UThRatios: {
        if (text.isEmpty()) {
            d.uth.reset();
            break;
        }
        const QStringList parts = text.split(QLatin1Char(';'));
        const auto th = parts.size() == 2 ? readValueWithSd(parts[0]) : std::nullopt;
        const auto u = parts.size() == 2 ? readValueWithSd(parts[1]) : std::nullopt;
        if (!th || !u) {
            bad = notPair(QStringLiteral("'0.0123 ± 0.0002; 1.145 ± 0.003' (230Th/238U, then "
                                         "234U/238U)"));
            break;
        }
        UThMeasurement m = d.uth.value_or(UThMeasurement{});
        m.th230_u238_act = th->first;
        m.th230_u238_act_sd = th->second;
        m.u234_u238_act = u->first;
        m.u234_u238_act_sd = u->second;
        d.uth = m;
        break;
    }
    case Th232:
    case U238:
        if (!d.uth) {
            bad = tr("%1: this date has no U-Th measurement; type its activity ratios first")
                      .arg(where);
            break;
        }
        bad = optionalNumber(column == Th232 ? d.uth->th232_ppb : d.uth->u238_ppb);
        break;
    case F14C: {
        if (text.isEmpty()) {
            d.c14.reset();
            break;
        }
        const auto f = readValueWithSd(text);
        if (!f) {
            bad = notPair(QStringLiteral("'0.77094 ± 0.00251'"));
            break;
        }
        C14Measurement m = d.c14.value_or(C14Measurement{});
        m.f14c = f->first;
        m.f14c_sd = f->second;
        d.c14 = m;
        break;
    }
    case DeltaR: {
        if (!d.c14) {
            bad = tr("%1: this date has no F14C measurement; type it first").arg(where);
            break;
        }
        if (text.isEmpty()) {
            d.c14->delta_r_yr.reset();
            d.c14->delta_r_sd_yr.reset();
            break;
        }
        if (const auto f = readValueWithSd(text)) {
            d.c14->delta_r_yr = f->first;
            d.c14->delta_r_sd_yr = f->second;
        } else if (const auto n = readNumber(text)) {
            d.c14->delta_r_yr = *n;
            d.c14->delta_r_sd_yr.reset();
        } else {
            bad = notPair(QStringLiteral("'-50 ± 30' (years)"));
        }
        break;
    }
    default: bad = tr("%1 cannot be typed").arg(where);
    }
    if (bad) {
        return *bad;
    }
    return db::EditableRow{d};
}

QString DatesTableModel::rowName(int r) const {
    const NumericalDate &d = dateAt(r);
    const QString where = d.sample ? tr("sample %1").arg(QString::fromStdString(*d.sample))
                          : d.depth_m ? tr("%1 m").arg(exactNumberText(*d.depth_m))
                                      : tr("no place");
    return tr("date (%1) at %2").arg(word(toString(d.method)), where);
}

QString DatesTableModel::editLabel(int r, int column) const {
    return tr("%1 of %2").arg(QLatin1String(kFieldNames[column]), rowName(r));
}

DeskTableModel::TypedRow DatesTableModel::newRow() const {
    if (rows_.empty()) {
        return tr("dates: hole '%1' has no date to copy; a new date is a copy of the hole's "
                  "last one, typed over (import the first date with the hole's data)")
            .arg(QString::fromStdString(hole()));
    }
    // On the first sample below the last dated one that has no date yet (else the first
    // undated sample): a copy at the same place would be two equal rows, and an edit names a
    // row by its value.
    std::vector<const Sample *> samples;
    for (const Sample &s : desk().data().samples) {
        if (s.hole == hole()) {
            samples.push_back(&s);
        }
    }
    std::stable_sort(samples.begin(), samples.end(),
                     [](const Sample *a, const Sample *b) { return a->top_m < b->top_m; });
    const NumericalDate &last = rows_.back();
    auto dated = [&](const Sample *s) {
        return std::any_of(rows_.begin(), rows_.end(),
                           [&](const NumericalDate &d) { return d.sample == s->sample; });
    };
    const double below_m = last.depth_m ? *last.depth_m : -1.0;
    const Sample *pick = nullptr;
    bool passed = !last.sample;
    for (const Sample *s : samples) {
        if (!passed) {
            passed = last.sample && s->sample == *last.sample;
            continue;
        }
        if (s->top_m >= below_m && !dated(s)) {
            pick = s;
            break;
        }
    }
    if (!pick) {
        const auto any = std::find_if(samples.begin(), samples.end(), [&](const Sample *s) { return !dated(s); });
        pick = any == samples.end() ? nullptr : *any;
    }
    if (!pick) {
        return tr("dates: every sample of hole '%1' has a date; add the sample to date first, "
                  "then add the date")
            .arg(QString::fromStdString(hole()));
    }
    NumericalDate d = last;
    d.sample = pick->sample;
    d.depth_m.reset();
    return db::EditableRow{d};
}

} // namespace atollog::view
