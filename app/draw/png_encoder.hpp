#pragma once

#include <QByteArray>

class QImage;

namespace atollog::draw {

/// Rows compressed together. Each block is compressed on its own, so blocks can go to
/// different threads, and the file's bytes depend on the image alone, not on the thread count.
inline constexpr int kPngRowsPerBlock = 256;

/// `image` (QImage::Format_RGB32, taken as opaque) as an 8-bit RGB PNG file (ISO/IEC
/// 15948:2004, "PNG (Portable Network Graphics) Specification, Second Edition"): IHDR, pHYs
/// from the image's dots per metre, the pixels in IDAT chunks, IEND. Scanlines carry filter type
/// 0 (none): drawings are flat colour, which the deflate stage packs well as it is, and the
/// other filters made the files larger here. The one zlib stream (RFC 1950, deflate RFC 1951,
/// level 1) is made of blocks of kPngRowsPerBlock rows compressed on up to `threads` threads
/// and joined at byte boundaries (each ends in a sync flush), its Adler-32 combined from
/// theirs. Throws std::invalid_argument for a null image or another format, and
/// std::runtime_error when zlib fails.
QByteArray encodePng(const QImage &image, int threads);

} // namespace atollog::draw
