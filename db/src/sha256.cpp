// SHA-256 through OpenSSL's EVP digest interface: a well-kept implementation that uses the SHA
// extensions or SIMD of the processor (the hand-written FIPS 180-4 version it replaced cost a
// tenth of an import of a million occurrences). tests/db/test_sha256.cpp checks it against the
// NIST example vectors.
#include "atollog/db/sha256.hpp"

#include <openssl/evp.h>

#include <stdexcept>

namespace atollog::db {

struct Sha256::Context {
    EVP_MD_CTX* ctx = nullptr;
    bool finished = false;
    ~Context() { EVP_MD_CTX_free(ctx); }
};

Sha256::Sha256() : context_(std::make_unique<Context>()) {
    context_->ctx = EVP_MD_CTX_new();
    if (context_->ctx == nullptr || EVP_DigestInit_ex(context_->ctx, EVP_sha256(), nullptr) != 1) {
        throw std::runtime_error("SHA-256: OpenSSL could not start a digest");
    }
}

Sha256::~Sha256() = default;

void Sha256::update(std::string_view bytes) {
    if (context_->finished) {
        throw std::logic_error("SHA-256: update after digest");
    }
    if (!bytes.empty() && EVP_DigestUpdate(context_->ctx, bytes.data(), bytes.size()) != 1) {
        throw std::runtime_error("SHA-256: OpenSSL digest update failed");
    }
}

std::array<std::uint8_t, 32> Sha256::digest() {
    if (context_->finished) {
        throw std::logic_error("SHA-256: digest taken twice");
    }
    std::array<std::uint8_t, 32> out{};
    unsigned int length = 0;
    if (EVP_DigestFinal_ex(context_->ctx, out.data(), &length) != 1 || length != out.size()) {
        throw std::runtime_error("SHA-256: OpenSSL digest failed");
    }
    context_->finished = true;
    return out;
}

std::string Sha256::hexDigest() {
    static constexpr char kHex[] = "0123456789abcdef";
    std::string s;
    for (const std::uint8_t b : digest()) {
        s += kHex[b >> 4];
        s += kHex[b & 15];
    }
    return s;
}

std::string sha256Hex(std::string_view bytes) {
    Sha256 h;
    h.update(bytes);
    return h.hexDigest();
}

} // namespace atollog::db
