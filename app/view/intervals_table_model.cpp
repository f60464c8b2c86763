#include "view/intervals_table_model.hpp"

#include "atollog/engine/number_text.hpp"
#include "atollog/engine/texture_classifier.hpp"
#include "view/desk_project.hpp"
#include "view/next_interval.hpp"
#include "view/word_choice_delegate.hpp"

#include <algorithm>
#include <stdexcept>

namespace atollog::view {

namespace {

// The folder's column names, for undo labels and header tooltips.
const char *const kFieldNames[] = {
    "top_m",   "base_m",          "rock",          "mud_supported",    "grains_pct",
    "coarse_pct", "binding",      "(suggested)",   "texture",          "base_surface",
    "paleodepth_min_m", "paleodepth_max_m", "dry_density_g_cm3", "porosity_pct", "caco3_pct",
    "notes"};

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }

QString optionalNumberText(const std::optional<double> &v) {
    return v ? numberCellText(*v) : QString();
}

QString optionalDepthText(const std::optional<double> &v, DepthUnit unit) {
    return v ? depthText(*v, unit) : QString();
}

/// The classifier's suggestion for the interval, or nullopt (not a carbonate, or attributes
/// it cannot judge: the texture check reports those).
std::optional<TextureSuggestion> suggestionFor(const LithInterval &v) {
    if (!isCarbonate(v.rock)) {
        return std::nullopt;
    }
    try {
        return classifyTexture(textureAttributesOf(v));
    } catch (const std::invalid_argument &) {
        return std::nullopt; // a percentage out of range: validateValueRanges names it
    }
}

} // namespace

IntervalsTableModel::IntervalsTableModel(DeskProject &desk, QObject *parent)
    : DeskRows(desk, parent) {}

QString IntervalsTableModel::columnTitle(int column) const {
    const QString unit = unitSymbol(depthUnit());
    switch (column) {
    case Top: return tr("Top (%1)").arg(unit);
    case Base: return tr("Base (%1)").arg(unit);
    case Rock: return tr("Rock");
    case MudSupported: return tr("Mud-supported");
    case Grains: return tr("Grains (%)");
    case Coarse: return tr("Over 2 mm (%)");
    case Binding: return tr("Binding");
    case Suggested: return tr("Texture from attributes");
    case Texture: return tr("Texture");
    case Surface: return tr("Base surface");
    case PaleodepthMin: return tr("Paleodepth min (%1)").arg(unit);
    case PaleodepthMax: return tr("Paleodepth max (%1)").arg(unit);
    case Density: return tr("Dry density (g/cm³)");
    case Porosity: return tr("Porosity (%)");
    case Carbonate: return tr("CaCO₃ (%)");
    case Notes: return tr("Notes");
    default: return {};
    }
}

QString IntervalsTableModel::columnTip(int column) const {
    switch (column) {
    case Rock: return tr("One of: %1").arg(word(allowedWords<atollog::Rock>()));
    case MudSupported: return tr("yes, no, or empty when not judged");
    case Binding: return tr("One of: %1").arg(word(allowedWords<atollog::Binding>()));
    case Suggested:
        return tr("Computed from mud support, grains, coarse share and binding (Dunham 1962, "
                  "Embry & Klovan 1971); not stored");
    case Texture: return tr("One of: %1").arg(word(allowedWords<atollog::Texture>()));
    case Surface: return tr("One of: %1").arg(word(allowedWords<atollog::Surface>()));
    default: return tr("Stored as %1").arg(QLatin1String(kFieldNames[column]));
    }
}

QString IntervalsTableModel::cellText(int r, int column) const {
    const LithInterval &v = intervalAt(r);
    const DepthUnit unit = depthUnit();
    switch (column) {
    case Top: return depthText(v.top_m, unit);
    case Base: return depthText(v.base_m, unit);
    case Rock: return word(toString(v.rock));
    case MudSupported:
        return v.mud_supported ? (*v.mud_supported ? QStringLiteral("yes") : QStringLiteral("no"))
                               : QString();
    case Grains: return optionalNumberText(v.grains_pct);
    case Coarse: return optionalNumberText(v.coarse_pct);
    case Binding: return v.binding ? word(toString(*v.binding)) : QString();
    case Suggested: {
        const auto s = suggestionFor(v);
        return s && s->texture ? word(toString(*s->texture)) : QString();
    }
    case Texture: return v.texture ? word(toString(*v.texture)) : QString();
    case Surface: return word(toString(v.base_surface));
    case PaleodepthMin: return optionalDepthText(v.paleodepth_min_m, unit);
    case PaleodepthMax: return optionalDepthText(v.paleodepth_max_m, unit);
    case Density: return optionalNumberText(v.dry_density_g_cm3);
    case Porosity: return optionalNumberText(v.porosity_pct);
    case Carbonate: return optionalNumberText(v.caco3_pct);
    case Notes: return QString::fromStdString(v.notes);
    default: return {};
    }
}

namespace {

template <class Enum> QStringList wordsOf(bool may_be_empty) {
    QStringList words;
    if (may_be_empty) {
        words << QString();
    }
    for (const Enum e : allValues<Enum>()) {
        words << word(toString(e));
    }
    return words;
}

} // namespace

QVariant IntervalsTableModel::data(const QModelIndex &index, int role) const {
    if (role != kWordChoicesRole) {
        return DeskTableModel::data(index, role);
    }
    switch (index.column()) {
    case Rock: return wordsOf<atollog::Rock>(false);
    case MudSupported: return QStringList{QString(), QStringLiteral("yes"), QStringLiteral("no")};
    case Binding: return wordsOf<atollog::Binding>(true);
    case Texture: return wordsOf<atollog::Texture>(true);
    case Surface: return wordsOf<atollog::Surface>(false);
    default: return {};
    }
}

QString IntervalsTableModel::cellToolTip(int r, int column) const {
    if (column != Suggested) {
        return {};
    }
    const auto s = suggestionFor(intervalAt(r));
    return s ? QString::fromStdString(s->reason) : tr("texture classes apply to carbonates only");
}

DeskTableModel::TypedRow IntervalsTableModel::typed(int r, int column, const QString &text) const {
    LithInterval v = intervalAt(r);
    const QString field = columnTitle(column);
    const QString where = tr("intervals: interval %1-%2 m of hole '%3': %4")
                              .arg(word(numberText(v.top_m)), word(numberText(v.base_m)),
                                   QString::fromStdString(v.hole), field);
    const QString lower = text.toLower();
    const std::string w = lower.toStdString();

    // A number, optional unless `required`; depths in the desk's unit.
    auto number = [&](std::optional<double> &out, bool required, bool depth) -> std::optional<QString> {
        if (text.isEmpty() && !required) {
            out.reset();
            return std::nullopt;
        }
        const std::optional<double> n = readNumber(text);
        if (!n) {
            return tr("%1: '%2' is not a number; type a number%3%4")
                .arg(where, text,
                     depth ? tr(" in %1").arg(unitSymbol(depthUnit())) : QString(),
                     required ? QString() : tr(", or clear the field when not measured"));
        }
        out = depth ? depthInMetres(*n, depthUnit()) : *n;
        return std::nullopt;
    };
    auto notAWord = [&](const std::string &allowed) {
        return tr("%1: '%2' is not a known word; type one of %3").arg(where, text, word(allowed));
    };

    std::optional<QString> bad;
    std::optional<double> n;
    switch (column) {
    case Top:
        if (!(bad = number(n, true, true))) v.top_m = *n;
        break;
    case Base:
        if (!(bad = number(n, true, true))) v.base_m = *n;
        break;
    case Rock:
        if (const auto rock = parseRock(w)) v.rock = *rock;
        else bad = notAWord(allowedWords<atollog::Rock>());
        break;
    case MudSupported:
        if (lower.isEmpty()) v.mud_supported.reset();
        else if (lower == QLatin1String("yes") || lower == QLatin1String("y")) v.mud_supported = true;
        else if (lower == QLatin1String("no") || lower == QLatin1String("n")) v.mud_supported = false;
        else bad = tr("%1: '%2' is not yes or no; type yes, no, or clear the field").arg(where, text);
        break;
    case Grains: bad = number(v.grains_pct, false, false); break;
    case Coarse: bad = number(v.coarse_pct, false, false); break;
    case Binding:
        if (lower.isEmpty()) v.binding.reset();
        else if (const auto b = parseBinding(w)) v.binding = *b;
        else bad = notAWord(allowedWords<atollog::Binding>());
        break;
    case Texture:
        if (lower.isEmpty()) v.texture.reset();
        else if (const auto t = parseTexture(w)) v.texture = *t;
        else bad = notAWord(allowedWords<atollog::Texture>());
        break;
    case Surface:
        if (lower.isEmpty()) v.base_surface = atollog::Surface::None;
        else if (const auto s = parseSurface(w)) v.base_surface = *s;
        else bad = notAWord(allowedWords<atollog::Surface>());
        break;
    case PaleodepthMin: bad = number(v.paleodepth_min_m, false, true); break;
    case PaleodepthMax: bad = number(v.paleodepth_max_m, false, true); break;
    case Density: bad = number(v.dry_density_g_cm3, false, false); break;
    case Porosity: bad = number(v.porosity_pct, false, false); break;
    case Carbonate: bad = number(v.caco3_pct, false, false); break;
    case Notes: v.notes = text.toStdString(); break;
    default: bad = tr("%1 is computed, not typed").arg(field);
    }
    if (bad) {
        return *bad;
    }
    return db::EditableRow{v};
}

QString IntervalsTableModel::editLabel(int r, int column) const {
    const LithInterval &v = intervalAt(r);
    return tr("%1 of interval %2-%3 m")
        .arg(QLatin1String(kFieldNames[column]), word(numberText(v.top_m)),
             word(numberText(v.base_m)));
}

QModelIndex IntervalsTableModel::addInterval() {
    const NextInterval next = nextInterval(desk().data(), hole());
    if (!next.interval) {
        // Not an edit, but the desk's message line is where the logger looks.
        desk().reportRefusal(QString::fromStdString(next.refusal));
        return {};
    }
    const LithInterval added = *next.interval;
    if (!desk().edit(db::RowEdit::add(added), tr("add interval %1-%2 m")
                                                  .arg(word(numberText(added.top_m)),
                                                       word(numberText(added.base_m))))) {
        return {};
    }
    for (int r = storedRowCount() - 1; r >= 0; --r) {
        if (intervalAt(r) == added) {
            return index(r, Base);
        }
    }
    return {};
}

QString IntervalsTableModel::rowName(int r) const {
    const LithInterval &v = intervalAt(r);
    return tr("interval %1-%2 m").arg(word(numberText(v.top_m)), word(numberText(v.base_m)));
}

DeskTableModel::TypedRow IntervalsTableModel::newRow() const {
    const NextInterval next = nextInterval(desk().data(), hole());
    if (!next.interval) {
        return QString::fromStdString(next.refusal);
    }
    return db::EditableRow{*next.interval};
}

} // namespace atollog::view
