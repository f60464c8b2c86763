#pragma once
// Runs the command line in-process and captures what it prints.
#include "cli/run_cli.hpp"

#include <filesystem>
#include <unistd.h>
#include <initializer_list>
#include <sstream>
#include <string>
#include <vector>

namespace atollog::test {

struct CliResult {
    int exit_code = -1;
    std::string out;
    std::string err;
};

inline CliResult runAtollog(std::vector<std::string> args) {
    args.insert(args.begin(), "atollog");
    std::vector<const char*> argv;
    for (const auto& a : args) argv.push_back(a.c_str());
    std::ostringstream out, err;
    CliResult r;
    r.exit_code = cli::runCli(static_cast<int>(argv.size()), argv.data(), out, err);
    r.out = out.str();
    r.err = err.str();
    return r;
}

/// A fresh temporary directory removed when the object goes out of scope.
class TempDir {
  public:
    explicit TempDir(const std::string& tag) {
        static int counter = 0;
        path_ = std::filesystem::temp_directory_path() /
                ("atollog-test-" + tag + "-" + std::to_string(::getpid()) + "-" + std::to_string(++counter));
        std::filesystem::remove_all(path_);
        std::filesystem::create_directories(path_);
    }
    ~TempDir() {
        std::error_code ec;
        std::filesystem::remove_all(path_, ec);
    }
    TempDir(const TempDir&) = delete;
    TempDir& operator=(const TempDir&) = delete;
    const std::filesystem::path& path() const { return path_; }
    std::filesystem::path operator/(const std::string& name) const { return path_ / name; }

  private:
    std::filesystem::path path_;
};

/// Every file of a folder, name -> bytes, for comparing two exports.
std::vector<std::pair<std::string, std::string>> folderContents(const std::filesystem::path& dir);

} // namespace atollog::test
