#pragma once
// SHA-256 (FIPS 180-4) for input hashes in provenance records, computed by OpenSSL's libcrypto
// (EVP interface), which uses the processor's SHA extensions where it has them.
#include <array>
#include <cstdint>
#include <memory>
#include <string>
#include <string_view>

namespace atollog::db {

class Sha256 {
  public:
    Sha256(); ///< throws std::runtime_error when libcrypto cannot start a digest
    ~Sha256();
    Sha256(const Sha256&) = delete;
    Sha256& operator=(const Sha256&) = delete;

    void update(std::string_view bytes);
    std::array<std::uint8_t, 32> digest(); ///< finishes; the object is then spent
    std::string hexDigest();

  private:
    struct Context;
    std::unique_ptr<Context> context_;
};

std::string sha256Hex(std::string_view bytes);

} // namespace atollog::db
