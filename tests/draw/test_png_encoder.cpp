// The PNG encoder against the PNG specification (ISO/IEC 15948:2004, second edition) and
// against an independent decoder: Qt's PNG reader (libpng), which checks chunk CRCs and the
// zlib stream (RFC 1950/1951) when it reads.
#include "draw/png_encoder.hpp"

#include <catch2/catch.hpp>

#include <QImage>

#include <array>
#include <cstdint>
#include <random>

using namespace atollog::draw;

namespace {

/// CRC-32 as in the specification's Annex D sample code (polynomial 0xEDB88320, reflected,
/// initial and final XOR 0xFFFFFFFF), written out here so the check does not use zlib's.
std::uint32_t specCrc(const unsigned char *data, std::size_t size) {
    std::array<std::uint32_t, 256> table{};
    for (std::uint32_t n = 0; n < 256; ++n) {
        std::uint32_t c = n;
        for (int k = 0; k < 8; ++k) {
            c = (c & 1u) ? 0xEDB88320u ^ (c >> 1) : c >> 1;
        }
        table[n] = c;
    }
    std::uint32_t c = 0xFFFFFFFFu;
    for (std::size_t i = 0; i < size; ++i) {
        c = table[(c ^ data[i]) & 0xFFu] ^ (c >> 8);
    }
    return c ^ 0xFFFFFFFFu;
}

std::uint32_t bigEndian(const QByteArray &b, qsizetype at) {
    const auto *p = reinterpret_cast<const unsigned char *>(b.constData() + at);
    return (std::uint32_t{p[0]} << 24) | (std::uint32_t{p[1]} << 16) | (std::uint32_t{p[2]} << 8) |
           std::uint32_t{p[3]};
}

struct Chunk {
    QByteArray type;
    QByteArray data;
    bool crc_ok = false;
};

/// Splits a PNG file after its signature into chunks (5.3: length, type, data, CRC).
std::vector<Chunk> chunks(const QByteArray &png) {
    std::vector<Chunk> out;
    qsizetype at = 8;
    while (at + 12 <= png.size()) {
        const auto length = static_cast<qsizetype>(bigEndian(png, at));
        REQUIRE(at + 12 + length <= png.size());
        Chunk c;
        c.type = png.mid(at + 4, 4);
        c.data = png.mid(at + 8, length);
        const auto *typed = reinterpret_cast<const unsigned char *>(png.constData() + at + 4);
        c.crc_ok =
            specCrc(typed, static_cast<std::size_t>(4 + length)) == bigEndian(png, at + 8 + length);
        out.push_back(c);
        at += 12 + length;
    }
    CHECK(at == png.size());
    return out;
}

/// A picture with flat areas, a gradient and noise, 1,001 x 600 px: three blocks of rows, the
/// last one short, and a width that is not a multiple of anything.
QImage sampleImage() {
    QImage image(1001, 600, QImage::Format_RGB32);
    std::mt19937 rng(20240611);
    for (int y = 0; y < image.height(); ++y) {
        auto *line = reinterpret_cast<QRgb *>(image.scanLine(y));
        for (int x = 0; x < image.width(); ++x) {
            if (x < 300) {
                line[x] = qRgb(255, 255, 255);
            } else if (x < 600) {
                line[x] = qRgb(x % 256, y % 256, (x + y) % 256);
            } else {
                line[x] = qRgb(static_cast<int>(rng() % 256), static_cast<int>(rng() % 256),
                               static_cast<int>(rng() % 256));
            }
        }
    }
    image.setDotsPerMeterX(11811); // 300 dpi
    image.setDotsPerMeterY(11811);
    return image;
}

} // namespace

TEST_CASE("Encoded PNG decodes to the same pixels", "[draw][png]") {
    const QImage image = sampleImage();
    const QByteArray png = encodePng(image, 2);
    QImage decoded;
    REQUIRE(decoded.loadFromData(png, "PNG"));
    CHECK(decoded.size() == image.size());
    CHECK(decoded.convertToFormat(QImage::Format_RGB32) == image);
    CHECK(decoded.dotsPerMeterX() == 11811);
    CHECK(decoded.dotsPerMeterY() == 11811);
}

TEST_CASE("Encoded PNG follows the specification's layout", "[draw][png]") {
    const QByteArray png = encodePng(sampleImage(), 3);
    // 5.2: the signature 137 80 78 71 13 10 26 10.
    CHECK(png.left(8) == QByteArray("\x89PNG\r\n\x1a\n", 8));
    const std::vector<Chunk> cs = chunks(png);
    REQUIRE(cs.size() >= 4);
    for (const Chunk &c : cs) {
        CAPTURE(c.type.toStdString());
        CHECK(c.crc_ok);
    }
    // 11.2.2 IHDR: width, height, bit depth 8, colour type 2 (truecolour), compression method
    // 0, filter method 0, interlace method 0.
    REQUIRE(cs.front().type == "IHDR");
    REQUIRE(cs.front().data.size() == 13);
    CHECK(bigEndian(cs.front().data, 0) == 1001);
    CHECK(bigEndian(cs.front().data, 4) == 600);
    CHECK(cs.front().data.mid(8) == QByteArray("\x08\x02\x00\x00\x00", 5));
    // 11.3.5.3 pHYs: 11,811 px per metre both ways, unit 1 (metre).
    REQUIRE(cs[1].type == "pHYs");
    CHECK(bigEndian(cs[1].data, 0) == 11811);
    CHECK(bigEndian(cs[1].data, 4) == 11811);
    CHECK(cs[1].data.at(8) == 1);
    // IDAT chunks one after another, then IEND, empty. Every PNG file ends in the same 12
    // bytes: length 0, "IEND", CRC AE 42 60 82.
    CHECK(cs[2].type == "IDAT");
    CHECK(cs.back().type == "IEND");
    CHECK(cs.back().data.isEmpty());
    CHECK(png.right(8) == QByteArray("IEND\xAE\x42\x60\x82", 8));
    // RFC 1950 2.2: the zlib stream starts with CMF 0x78 (deflate, 32 KiB window) and a FLG
    // making CMF * 256 + FLG a multiple of 31.
    const auto cmf = static_cast<unsigned char>(cs[2].data.at(0));
    const auto flg = static_cast<unsigned char>(cs[2].data.at(1));
    CHECK(cmf == 0x78);
    CHECK((cmf * 256 + flg) % 31 == 0);
}

TEST_CASE("Encoded PNG bytes do not depend on the thread count", "[draw][png]") {
    const QImage image = sampleImage();
    const QByteArray one = encodePng(image, 1);
    CHECK(encodePng(image, 2) == one);
    CHECK(encodePng(image, 7) == one);
    // A broken stream is caught by the decoder: flip one byte in the middle of the pixel data.
    QByteArray broken = one;
    broken[broken.size() / 2] = static_cast<char>(broken[broken.size() / 2] ^ 0x5A);
    QImage decoded;
    const bool read = decoded.loadFromData(broken, "PNG");
    CHECK((!read || decoded.convertToFormat(QImage::Format_RGB32) != image));
}

TEST_CASE("Flat drawings compress well", "[draw][png]") {
    // 2,000 x 2,000 px of white with a few boxes: raw RGB is 12 MB.
    QImage image(2000, 2000, QImage::Format_RGB32);
    image.fill(Qt::white);
    for (int b = 0; b < 40; ++b) {
        for (int y = 50 * b; y < 50 * b + 30; ++y) {
            auto *line = reinterpret_cast<QRgb *>(image.scanLine(y));
            for (int x = 100; x < 1900; ++x) {
                line[x] = qRgb(180, 210, 240);
            }
        }
    }
    const QByteArray png = encodePng(image, 2);
    CHECK(png.size() < 200'000);
    QImage decoded;
    REQUIRE(decoded.loadFromData(png, "PNG"));
    CHECK(decoded.convertToFormat(QImage::Format_RGB32) == image);
}

TEST_CASE("PNG encoder refuses what it cannot write", "[draw][png]") {
    CHECK_THROWS_AS(encodePng(QImage(), 1), std::invalid_argument);
    CHECK_THROWS_AS(encodePng(QImage(10, 10, QImage::Format_ARGB32), 1), std::invalid_argument);
}
