#pragma once
// Test helpers: a temporary folder removed at the end of the test, and writing/reading small
// core data folders from strings.
#include <filesystem>
#include <fstream>
#include <iterator>
#include <map>
#include <random>
#include <string>

namespace atollog::testing {

class TempFolder {
  public:
    TempFolder() {
        std::random_device device;
        path_ = std::filesystem::temp_directory_path() /
                ("atollog-folder-test-" + std::to_string(device()) + std::to_string(device()));
        std::filesystem::create_directories(path_);
    }
    ~TempFolder() {
        std::error_code ignored;
        std::filesystem::remove_all(path_, ignored);
    }
    TempFolder(const TempFolder&) = delete;
    TempFolder& operator=(const TempFolder&) = delete;
    const std::filesystem::path& path() const { return path_; }

  private:
    std::filesystem::path path_;
};

inline void writeText(const std::filesystem::path& path, const std::string& text) {
    std::filesystem::create_directories(path.parent_path());
    std::ofstream out(path, std::ios::binary);
    out << text;
}

inline std::string readText(const std::filesystem::path& path) {
    std::ifstream in(path, std::ios::binary);
    return std::string(std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>());
}

/// File name -> content, for a whole folder.
using FolderFiles = std::map<std::string, std::string>;

inline void writeFolder(const std::filesystem::path& folder, const FolderFiles& files) {
    std::filesystem::create_directories(folder);
    for (const auto& [name, text] : files) writeText(folder / name, text);
}

/// Every regular file of a folder with its content.
inline FolderFiles readFolder(const std::filesystem::path& folder) {
    FolderFiles files;
    for (const auto& entry : std::filesystem::directory_iterator(folder))
        if (entry.is_regular_file()) files[entry.path().filename().string()] = readText(entry.path());
    return files;
}

} // namespace atollog::testing
