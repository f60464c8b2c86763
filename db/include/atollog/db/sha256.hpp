#pragma once
// SHA-256 (FIPS 180-4) for input hashes in provenance records.
#include <array>
#include <cstdint>
#include <string>
#include <string_view>

namespace atollog::db {

class Sha256 {
  public:
    Sha256();
    void update(std::string_view bytes);
    std::array<std::uint8_t, 32> digest(); ///< finishes; the object is then spent
    std::string hexDigest();

  private:
    void block(const std::uint8_t* p);
    std::array<std::uint32_t, 8> h_;
    std::array<std::uint8_t, 64> buf_{};
    std::size_t buf_len_ = 0;
    std::uint64_t total_len_ = 0;
};

std::string sha256Hex(std::string_view bytes);

} // namespace atollog::db
