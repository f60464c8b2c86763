#pragma once
// A depth interval in which a datum lies, possibly open on one side (the taxon was found in the
// shallowest or deepest examined sample, so nothing bounds the datum on that side).
namespace atollog {

struct DepthBracket {
    double shallow_m = 0; ///< finite always; on an open side, the last depth known to qualify
    double deep_m = 0;
    bool open_shallow = false; ///< the datum may lie anywhere above shallow_m as well
    bool open_deep = false;    ///< the datum may lie anywhere below deep_m as well

    double width_m() const { return deep_m - shallow_m; }
    bool isOpen() const { return open_shallow || open_deep; }
    /// True when depth_m lies in the bracket, ends included, open sides unbounded.
    bool contains(double depth_m) const {
        return (open_shallow || depth_m >= shallow_m) && (open_deep || depth_m <= deep_m);
    }
    /// True when the whole bracket lies strictly above the whole of other (an open side never
    /// lies wholly anywhere).
    bool whollyAbove(const DepthBracket& other) const {
        return !open_deep && !other.open_shallow && deep_m < other.shallow_m;
    }
    bool operator==(const DepthBracket&) const = default;
};

} // namespace atollog
