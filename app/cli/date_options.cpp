#include "cli/date_options.hpp"

#include <sstream>
#include <stdexcept>

namespace atollog::cli {

DateSettings DateOptions::settings() const {
    DateSettings s;
    if (half_lives == "cheng2013") s.half_lives = UThHalfLifeSet::Cheng2013;
    else if (half_lives == "cheng2000") s.half_lives = UThHalfLifeSet::Cheng2000;
    else
        throw std::invalid_argument("--half-lives '" + half_lives +
                                    "': expected cheng2013 or cheng2000");
    s.d234u_tolerance_permil = d234u_tolerance_permil;
    s.include_failed_screen = include_failed_screen;
    s.detrital_correction = !no_detrital;
    s.detrital_th230_th232_atomic = detrital_ratio;
    s.mc_draws = mc_draws;
    s.seed = seed;
    return s;
}

std::string DateOptions::settingsText() const {
    std::ostringstream out;
    out.precision(17);
    out << "dates.half_lives=" << half_lives << "\ndates.d234u_tolerance_permil="
        << d234u_tolerance_permil << "\ndates.include_failed_screen=" << include_failed_screen
        << "\ndates.detrital_correction=" << !no_detrital
        << "\ndates.detrital_th230_th232_atomic=" << detrital_ratio
        << "\ndates.mc_draws=" << mc_draws << "\ndates.seed=" << seed;
    return out.str();
}

void addDateOptions(CLI::App& sub, DateOptions& o) {
    sub.add_option("--half-lives", o.half_lives,
                   "230Th and 234U half-lives: cheng2013 (Cheng et al. 2013) or cheng2000")
        ->check(CLI::IsMember({"cheng2013", "cheng2000"}))
        ->capture_default_str();
    sub.add_option("--d234u-tolerance", o.d234u_tolerance_permil,
                   "A U-Th date passes when its initial d234U lies within this many per mil of "
                   "modern seawater (146.8, Andersen et al. 2010)")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub.add_flag("--include-failed-screen", o.include_failed_screen,
                 "Use U-Th dates that fail the d234U screen in age models anyway");
    sub.add_flag("--no-detrital", o.no_detrital,
                 "No detrital 230Th correction even where th232_ppb and u238_ppb are given");
    sub.add_option("--detrital-ratio", o.detrital_ratio,
                   "Assumed initial 230Th/232Th atomic ratio of detrital thorium (+/- 50 %)")
        ->check(CLI::PositiveNumber)
        ->capture_default_str();
    sub.add_option("--mc-draws", o.mc_draws, "Monte Carlo draws per U-Th date")
        ->check(CLI::Range(100, 1000000))
        ->capture_default_str();
    sub.add_option("--date-seed", o.seed, "Seed of the dates' Monte Carlo")->capture_default_str();
}

} // namespace atollog::cli
