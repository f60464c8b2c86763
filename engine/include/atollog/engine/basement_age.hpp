#pragma once
// The age of a volcanic basement from the dates of its lavas: their inverse-variance weighted
// mean (Taylor 1997, "An Introduction to Error Analysis", eq. 7.10 and 7.12) with the MSWD of
// the dates about it (Wendt & Carl 1991, Chemical Geology 86:275, eq. 2). When MSWD > 1 the
// scatter exceeds the stated errors, and the sd of the mean is multiplied by sqrt(MSWD)
// (common practice in geochronology; e.g. Ludwig's Isoplot manual, from memory).
#include "atollog/engine/age_tie.hpp"

#include <string>
#include <vector>

namespace atollog {

struct PooledAge {
    double mean_ma = 0;
    double sd_ma = 0;        ///< of the mean, widened by sqrt(MSWD) when MSWD > 1
    double sd_plain_ma = 0;  ///< 1 / sqrt(sum of weights), not widened
    double mswd = 0;         ///< 0 for a single date
    int count = 0;
};

/// Pools ages given as mean and sd (sd > 0, all finite; at least one). Throws
/// std::invalid_argument naming the offending entry.
PooledAge pooledAge(const std::vector<double>& ages_ma, const std::vector<double>& sds_ma);

/// The ties lying wholly at or below `contact_m` (shallow_m >= contact_m) pooled into one tie at
/// the contact, labelled "basement (n dates, MSWD x)"; the others returned unchanged except that
/// a bracket reaching across the contact ends at it. No tie below the contact: the ties as
/// given (brackets still cut). Each pooled tie enters with its distribution's mean and sd.
std::vector<AgeTie> poolBasementTies(const std::vector<AgeTie>& ties, double contact_m);

} // namespace atollog
