// libFuzzer target: ProjectStore::open on a file holding the input bytes. The seed corpus holds
// a real small project, so the mutations explore damaged and edited projects as well as random
// bytes. ProjectError is the expected answer to a file that cannot be used; any other exception,
// a crash or a sanitizer report is a finding. A file that opens must also load: its dataset, its
// model runs and its row counts, again with ProjectError as the only allowed failure.
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"

#include <unistd.h>

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>

namespace {

namespace fs = std::filesystem;

/// One project path per fuzzing process; the file and SQLite's companions are removed before
/// every input and at exit.
class FuzzProjectFile {
  public:
    FuzzProjectFile()
        : path_(fs::temp_directory_path() /
                ("atollog-fuzz-project-" + std::to_string(::getpid()) + ".atollog")) {}
    ~FuzzProjectFile() { removeAll(); }
    FuzzProjectFile(const FuzzProjectFile&) = delete;
    FuzzProjectFile& operator=(const FuzzProjectFile&) = delete;
    const fs::path& path() const { return path_; }
    void removeAll() const {
        std::error_code ignored;
        for (const char* suffix : {"", "-wal", "-shm", "-journal"}) {
            fs::remove(path_.string() + suffix, ignored);
        }
    }

  private:
    fs::path path_;
};

void useOpenedProject(atollog::db::ProjectStore& store) {
    (void)store.schemaVersion();
    (void)store.loadDataset();
    (void)store.modelRuns();
    (void)store.hasData();
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    static FuzzProjectFile file;
    file.removeAll();
    {
        std::ofstream out(file.path(), std::ios::binary);
        out.write(reinterpret_cast<const char*>(data), static_cast<std::streamsize>(size));
    }
    try {
        atollog::db::ProjectStore store = atollog::db::ProjectStore::open(file.path());
        useOpenedProject(store);
    } catch (const atollog::db::ProjectError& e) {
        if (std::string(e.what()).empty()) {
            std::fprintf(stderr, "ProjectError without a message\n");
            std::abort();
        }
    }
    return 0;
}
