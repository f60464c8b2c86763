// SHA-256 against the published example vectors. Expected digests are copied from
// NIST's "Cryptographic Standards and Guidelines: Examples with Intermediate Values",
// SHA256.pdf (the FIPS 180-4 examples), and, for the empty string and the million 'a', from
// the NIST CAVP SHA-256 ShortMsg test file and FIPS 180-2 Appendix B.3 respectively.
#include "atollog/db/sha256.hpp"

#include <catch2/catch.hpp>

#include <string>

using atollog::db::Sha256;
using atollog::db::sha256Hex;

TEST_CASE("SHA-256 of the FIPS 180-4 example messages", "[unit]") {
    // NIST example SHA256.pdf, "One Block Message Sample" (FIPS 180-2 Appendix B.1).
    CHECK(sha256Hex("abc") ==
          "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    // NIST CAVP SHA256ShortMsg.rsp, Len = 0.
    CHECK(sha256Hex("") ==
          "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    // NIST example SHA256.pdf, "Two Block Message Sample" (FIPS 180-2 Appendix B.2), 448 bits.
    CHECK(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") ==
          "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
}

TEST_CASE("SHA-256 of one million 'a'", "[unit]") {
    // FIPS 180-2 Appendix B.3, "Long Message": 1,000,000 repetitions of 'a'.
    const std::string expected =
        "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0";
    CHECK(sha256Hex(std::string(1'000'000, 'a')) == expected);

    // The same message fed in uneven pieces must give the same digest: exercises the
    // partial-block buffering of update().
    Sha256 hasher;
    const std::string piece(997, 'a');
    std::size_t fed = 0;
    while (fed + piece.size() <= 1'000'000) {
        hasher.update(piece);
        fed += piece.size();
    }
    hasher.update(std::string(1'000'000 - fed, 'a'));
    CHECK(hasher.hexDigest() == expected);
}

TEST_CASE("SHA-256 padding boundaries agree between one-shot and byte-wise feeding", "[unit]") {
    // 55, 56 and 64 bytes straddle the point where the length no longer fits the last block
    // (FIPS 180-4, 5.1.1). Two feeding paths must agree, and differ from each other's lengths.
    for (std::size_t n : {55u, 56u, 63u, 64u, 65u, 119u, 120u}) {
        const std::string message(n, 'x');
        Sha256 bytewise;
        for (char c : message) bytewise.update(std::string_view(&c, 1));
        INFO("length " << n);
        CHECK(bytewise.hexDigest() == sha256Hex(message));
        CHECK(sha256Hex(message) != sha256Hex(message + "x"));
    }
}
