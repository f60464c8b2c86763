// libFuzzer target: atollog::db::readCoreFolder on a folder built from the input bytes.
// Framing: the input is split at lines "@@<name>"; the text after each such line, up to the next
// one, becomes the file <name>.csv (name reduced to [a-z0-9_], at most 24 characters, so nothing
// is written outside the folder). Text before the first "@@" line is holes.csv. InputError is
// the expected answer to bad input; any other exception, a crash or a sanitizer report is a
// finding.
#include "atollog/db/core_folder.hpp"
#include "atollog/db/errors.hpp"

#include <unistd.h>

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
#include <string>
#include <string_view>

namespace {

namespace fs = std::filesystem;

/// One folder per fuzzing process, emptied before every input and removed at exit.
class FuzzFolder {
  public:
    FuzzFolder()
        : path_(fs::temp_directory_path() /
                ("atollog-fuzz-folder-" + std::to_string(::getpid()))) {}
    ~FuzzFolder() {
        std::error_code ignored;
        fs::remove_all(path_, ignored);
    }
    FuzzFolder(const FuzzFolder&) = delete;
    FuzzFolder& operator=(const FuzzFolder&) = delete;
    const fs::path& fresh() {
        fs::remove_all(path_);
        fs::create_directories(path_);
        return path_;
    }

  private:
    fs::path path_;
};

std::string fileNameOf(std::string_view marker_line) {
    std::string name;
    for (const char c : marker_line) {
        if (name.size() == 24) break;
        if ((c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_') name += c;
    }
    return name.empty() ? std::string("unnamed.csv") : name + ".csv";
}

/// File name -> content. A later section of the same name appends to the earlier one.
std::map<std::string, std::string> splitIntoFiles(std::string_view input) {
    std::map<std::string, std::string> files;
    std::string current = "holes.csv";
    files[current];
    std::size_t pos = 0;
    while (pos < input.size()) {
        std::size_t end = input.find('\n', pos);
        const std::size_t next = end == std::string_view::npos ? input.size() : end + 1;
        const std::string_view line = input.substr(pos, next - pos);
        if (line.substr(0, 2) == "@@") {
            current = fileNameOf(line.substr(2));
            files[current];
        } else {
            files[current] += line;
        }
        pos = next;
    }
    return files;
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    static FuzzFolder folder;
    const fs::path& dir = folder.fresh();
    const std::string_view input(reinterpret_cast<const char*>(data), size);
    for (const auto& [name, text] : splitIntoFiles(input)) {
        std::ofstream(dir / name, std::ios::binary) << text;
    }
    try {
        std::vector<atollog::db::InputProblem> warnings;
        (void)atollog::db::readCoreFolder(dir, &warnings);
    } catch (const atollog::db::InputError& e) {
        if (e.problems().empty()) {
            std::fprintf(stderr, "InputError without a problem\n");
            std::abort();
        }
    }
    return 0;
}
