// The form of a numerical date: where it is (sample or depth) and what it gives (an entered age
// with its sd, or the raw measurement its method needs).
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/validation_detail.hpp"

namespace atollog::detail {

void validateDateForms(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.dates.size(); ++i) {
        const NumericalDate &d = data.dates[i];
        const std::string method(toString(d.method));
        const std::string subject = "date (" + method + ") of hole " + quoted(d.hole);
        const bool has_sample = d.sample && !d.sample->empty();

        if (has_sample && d.depth_m)
            out.error(Table::Dates, i, "depth_m", numberText(*d.depth_m),
                      subject + " gives both sample " + quoted(*d.sample) + " and depth_m " +
                          numberText(*d.depth_m),
                      "give one of them: the sample when the date is on a sample, else depth_m");
        if (!has_sample && !d.depth_m)
            out.error(Table::Dates, i, "sample", "", subject + " gives neither sample nor depth_m",
                      "give the dated sample's id, or the depth in metres below the collar");

        if (d.age_ma.has_value() != d.age_sd_ma.has_value()) {
            const bool sd_missing = d.age_ma.has_value();
            out.error(Table::Dates, i, sd_missing ? "age_sd_ma" : "age_ma",
                      sd_missing ? "" : numberText(*d.age_sd_ma),
                      subject + (sd_missing ? " gives age_ma " + numberText(*d.age_ma) +
                                                  " without age_sd_ma"
                                            : " gives age_sd_ma " + numberText(*d.age_sd_ma) +
                                                  " without age_ma"),
                      "an entered age needs both the age and its one-sd uncertainty");
        }
        if (d.uth && d.method != DateMethod::UTh)
            out.error(Table::Dates, i, "th230_u238_act", numberText(d.uth->th230_u238_act),
                      subject +
                          " carries a U-Th measurement (activity ratios) but its method "
                          "is " +
                          method,
                      "set method to u-th, or remove the activity-ratio columns");
        if (d.c14 && d.method != DateMethod::C14)
            out.error(Table::Dates, i, "f14c", numberText(d.c14->f14c),
                      subject + " carries a radiocarbon measurement (f14c) but its method is " +
                          method,
                      "set method to c14, or remove the f14c columns");

        const bool has_measurement =
            (d.uth && d.method == DateMethod::UTh) || (d.c14 && d.method == DateMethod::C14);
        const bool has_age = d.age_ma.has_value() || d.age_sd_ma.has_value();
        if (!has_age && !has_measurement && !d.uth && !d.c14)
            out.error(Table::Dates, i, "age_ma", "", subject + " gives no age and no measurement",
                      d.method == DateMethod::UTh
                          ? "give age_ma with age_sd_ma, or the activity ratios th230_u238_act, "
                            "u234_u238_act and their sds"
                      : d.method == DateMethod::C14
                          ? "give age_ma with age_sd_ma, or f14c with f14c_sd"
                          : "give age_ma with age_sd_ma");
        if (d.age_ma && has_measurement)
            out.warning(Table::Dates, i, "age_ma", numberText(*d.age_ma),
                        subject + " gives both an entered age_ma " + numberText(*d.age_ma) +
                            " and a raw " + method + " measurement",
                        "keep one of them, so that it is clear which age is used");
    }
}

} // namespace atollog::detail
