#include "draw/fill_pattern_tile_cache.hpp"

namespace atollog::draw {

namespace {

std::size_t imageBytes(const std::shared_ptr<const QImage> &image) {
    return image ? static_cast<std::size_t>(image->sizeInBytes()) : 0;
}

} // namespace

FillPatternTileCache::FillPatternTileCache(std::size_t max_bytes) : max_bytes_(max_bytes) {}

std::shared_ptr<const QImage> FillPatternTileCache::tile(const FillPatternTileKey &key) {
    {
        const std::lock_guard lock(mutex_);
        if (const auto it = tiles_.find(key); it != tiles_.end()) {
            lru_.splice(lru_.begin(), lru_, it->second.age);
            return it->second.image;
        }
    }
    // Rendering takes up to a few milliseconds: not under the lock, so other threads finding
    // their tiles do not wait for it.
    QImage rendered = renderFillPatternTile(key);
    std::shared_ptr<const QImage> image;
    if (!rendered.isNull()) {
        image = std::make_shared<const QImage>(std::move(rendered));
    }
    const std::lock_guard lock(mutex_);
    ++renders_;
    if (const auto it = tiles_.find(key); it != tiles_.end()) {
        lru_.splice(lru_.begin(), lru_, it->second.age); // another thread was first: use its tile
        return it->second.image;
    }
    lru_.push_front(key);
    tiles_.emplace(key, Entry{image, lru_.begin()});
    bytes_ += imageBytes(image);
    evictLocked();
    return image;
}

void FillPatternTileCache::evictLocked() {
    // The newest tile stays even when it alone is over the budget: it is about to be painted.
    while (bytes_ > max_bytes_ && lru_.size() > 1) {
        const auto it = tiles_.find(lru_.back());
        bytes_ -= imageBytes(it->second.image);
        tiles_.erase(it);
        lru_.pop_back();
    }
}

std::size_t FillPatternTileCache::tilesHeld() const {
    const std::lock_guard lock(mutex_);
    return tiles_.size();
}

std::size_t FillPatternTileCache::bytesHeld() const {
    const std::lock_guard lock(mutex_);
    return bytes_;
}

std::uint64_t FillPatternTileCache::renders() const {
    const std::lock_guard lock(mutex_);
    return renders_;
}

FillPatternTileCache &FillPatternTileCache::shared() {
    static FillPatternTileCache cache;
    return cache;
}

} // namespace atollog::draw
