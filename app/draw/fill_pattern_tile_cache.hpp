#pragma once

#include "draw/fill_pattern_tile.hpp"

#include <QImage>

#include <cstddef>
#include <cstdint>
#include <list>
#include <map>
#include <memory>
#include <mutex>

namespace atollog::draw {

/// Rendered fill-pattern tiles by key, shared by every raster paint. Thread-safe: exportPng
/// paints bands on several threads at once. A tile is rendered on the first request for its key
/// (outside the lock; when two threads race, both render and the first stored copy wins, so every
/// caller gets the same tile). The least recently used tiles go when the tiles held exceed
/// `max_bytes` (a viewer zooming through many scales would otherwise keep every one).
class FillPatternTileCache {
  public:
    explicit FillPatternTileCache(std::size_t max_bytes = std::size_t{64} << 20);

    /// The tile for `key`; null (an empty pointer) when renderFillPatternTile gives a null image
    /// (FillPattern::None, or a tile too large: paint line work then). Throws what
    /// renderFillPatternTile throws.
    std::shared_ptr<const QImage> tile(const FillPatternTileKey &key);

    std::size_t tilesHeld() const;
    std::size_t bytesHeld() const;
    /// How many tiles were rendered since construction (for tests and benchmarks).
    std::uint64_t renders() const;

    /// The cache the painters use.
    static FillPatternTileCache &shared();

  private:
    struct Entry {
        std::shared_ptr<const QImage> image;
        std::list<FillPatternTileKey>::iterator age; // position in lru_
    };
    void evictLocked();

    const std::size_t max_bytes_;
    mutable std::mutex mutex_;
    std::map<FillPatternTileKey, Entry> tiles_;
    std::list<FillPatternTileKey> lru_; // most recently used first
    std::size_t bytes_ = 0;
    std::uint64_t renders_ = 0;
};

} // namespace atollog::draw
