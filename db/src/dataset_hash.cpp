// ProjectStore::datasetHash: SHA-256 over a canonical byte serialisation of a dataset.
//
// The encoding is unambiguous, so two different datasets never serialise to the same bytes:
// every table starts with its name and row count; strings carry a 64-bit length; numbers are
// fixed-width little-endian (doubles as their IEEE 754 bit pattern, with -0 written as +0 so
// that datasets equal under operator== hash equally); optionals and variants carry a tag byte;
// vocabulary values are written as their folder words, so reordering an enum keeps old hashes.
#include "atollog/db/project_store.hpp"
#include "atollog/db/sha256.hpp"

#include <bit>
#include <cstring>

namespace atollog::db {
namespace {

class CanonicalWriter {
  public:
    void u64(std::uint64_t v) {
        char bytes[8];
        for (int i = 0; i < 8; ++i) bytes[i] = static_cast<char>(v >> (8 * i));
        put(std::string_view(bytes, 8));
    }
    void i64(std::int64_t v) { u64(static_cast<std::uint64_t>(v)); }
    void real(double v) { u64(std::bit_cast<std::uint64_t>(v == 0.0 ? 0.0 : v)); }
    void text(std::string_view s) {
        u64(s.size());
        put(s);
    }
    void flag(bool b) { put(b ? std::string_view("\1", 1) : std::string_view("\0", 1)); }
    template <class Enum> void word(Enum v) { text(toString(v)); }

    void real(const std::optional<double>& v) {
        flag(v.has_value());
        if (v) real(*v);
    }
    void optionalText(const std::optional<std::string>& s) {
        flag(s.has_value());
        if (s) text(*s);
    }
    template <class Enum> void word(const std::optional<Enum>& v) {
        flag(v.has_value());
        if (v) word(*v);
    }
    void extra(const FreeAttributes& attributes) {
        u64(attributes.size());
        for (const auto& [name, value] : attributes) {
            text(name);
            text(value);
        }
    }
    std::string finish() {
        hasher_.update(buffer_);
        return hasher_.hexDigest();
    }

  private:
    void put(std::string_view bytes) {
        buffer_.append(bytes);
        if (buffer_.size() >= kFlushBytes) {
            hasher_.update(buffer_);
            buffer_.clear();
        }
    }
    static constexpr std::size_t kFlushBytes = 1 << 16;
    Sha256 hasher_;
    std::string buffer_;
};

template <class Row, class WriteRow>
void table(CanonicalWriter& w, Table t, const std::vector<Row>& rows, WriteRow writeRow) {
    w.text(tableName(t));
    w.u64(rows.size());
    for (const Row& row : rows) {
        writeRow(row);
        w.extra(row.extra);
    }
}

} // namespace

std::string ProjectStore::datasetHash(const CoreDataset& data) {
    CanonicalWriter w;
    w.text("atollog dataset hash v1"); // names the encoding, so a new one cannot collide
    table(w, Table::Holes, data.holes, [&](const Hole& h) {
        w.text(h.hole);
        w.text(h.site);
        w.real(h.lat_deg);
        w.real(h.lon_deg);
        w.real(h.collar_elev_m);
        w.real(h.chain_km);
        w.word(h.kind);
    });
    table(w, Table::Runs, data.runs, [&](const CoreRun& r) {
        w.text(r.hole);
        w.text(r.run);
        w.real(r.top_m);
        w.real(r.base_m);
        w.real(r.recovered_m);
    });
    table(w, Table::Intervals, data.intervals, [&](const LithInterval& l) {
        w.text(l.hole);
        w.real(l.top_m);
        w.real(l.base_m);
        w.word(l.rock);
        w.word(l.texture);
        w.flag(l.mud_supported.has_value());
        if (l.mud_supported) w.flag(*l.mud_supported);
        w.real(l.grains_pct);
        w.real(l.coarse_pct);
        w.word(l.binding);
        w.word(l.base_surface);
        w.real(l.paleodepth_min_m);
        w.real(l.paleodepth_max_m);
        w.real(l.dry_density_g_cm3);
        w.real(l.porosity_pct);
        w.real(l.caco3_pct);
        w.text(l.notes);
    });
    table(w, Table::Samples, data.samples, [&](const Sample& s) {
        w.text(s.hole);
        w.text(s.sample);
        w.real(s.top_m);
        w.real(s.base_m);
        w.text(s.kind);
    });
    table(w, Table::Taxa, data.taxa, [&](const Taxon& t) {
        w.text(t.taxon);
        w.text(t.name);
        w.word(t.group);
    });
    table(w, Table::Occurrences, data.occurrences, [&](const Occurrence& o) {
        w.text(o.sample);
        w.text(o.taxon);
        w.flag(o.abundance.has_value());
        if (o.abundance) {
            if (const auto* cls = std::get_if<AbundanceClass>(&*o.abundance)) {
                w.flag(false);
                w.word(*cls);
            } else {
                w.flag(true);
                w.i64(std::get<std::int64_t>(*o.abundance));
            }
        }
        w.word(o.status);
    });
    table(w, Table::Events, data.events, [&](const TimeScaleEvent& e) {
        w.text(e.event);
        w.text(e.taxon);
        w.word(e.kind);
        w.real(e.age_ma);
        w.real(e.age_sd_ma);
        w.text(e.source);
    });
    table(w, Table::Dates, data.dates, [&](const NumericalDate& d) {
        w.text(d.hole);
        w.optionalText(d.sample);
        w.real(d.depth_m);
        w.word(d.method);
        w.real(d.age_ma);
        w.real(d.age_sd_ma);
        w.flag(d.uth.has_value());
        if (d.uth) {
            w.real(d.uth->th230_u238_act);
            w.real(d.uth->th230_u238_act_sd);
            w.real(d.uth->u234_u238_act);
            w.real(d.uth->u234_u238_act_sd);
            w.real(d.uth->th232_ppb);
            w.real(d.uth->u238_ppb);
        }
        w.flag(d.c14.has_value());
        if (d.c14) {
            w.real(d.c14->f14c);
            w.real(d.c14->f14c_sd);
            w.real(d.c14->delta_r_yr);
            w.real(d.c14->delta_r_sd_yr);
        }
    });
    table(w, Table::Zones, data.zones, [&](const Zone& z) {
        w.text(z.scheme);
        w.text(z.zone);
        w.optionalText(z.base_event);
        w.optionalText(z.top_event);
    });
    table(w, Table::SeaLevel, data.sea_level, [&](const SeaLevelPoint& p) {
        w.real(p.age_ma);
        w.real(p.level_m);
        w.real(p.level_sd_m);
    });
    table(w, Table::Curve, data.curve, [&](const CalibrationPoint& p) {
        w.real(p.cal_bp);
        w.real(p.c14_bp);
        w.real(p.sd);
    });
    return w.finish();
}

} // namespace atollog::db
