#pragma once
// Runs a function in a forked child process, for tests that need a second writer or a process
// that can be killed at any moment. The child never returns into Catch: it leaves through
// _exit, with 0 when the function returned and 1 when it threw (the message goes to a pipe the
// parent reads). The parent must hold no open SQLite connection across fork: SQLite's POSIX
// locks belong to the process, and a child sharing them would corrupt the locking
// (https://www.sqlite.org/howtocorrupt.html, section 2.6).
#include <sys/types.h>
#include <sys/wait.h>
#include <unistd.h>

#include <cerrno>
#include <csignal>
#include <exception>
#include <functional>
#include <stdexcept>
#include <string>

namespace atollog::test {

class ChildProcess {
  public:
    /// Forks; the child waits for start() (when `wait_for_start`) and then runs `body`.
    explicit ChildProcess(const std::function<void()>& body, bool wait_for_start = false) {
        int out[2];
        int go[2];
        if (::pipe(out) != 0 || ::pipe(go) != 0) throw std::runtime_error("pipe failed");
        pid_ = ::fork();
        if (pid_ < 0) throw std::runtime_error("fork failed");
        if (pid_ == 0) {
            ::close(out[0]);
            ::close(go[1]);
            char c = 0;
            if (wait_for_start && ::read(go[0], &c, 1) != 1) ::_exit(3);
            int code = 0;
            try {
                body();
            } catch (const std::exception& e) {
                const std::string what = e.what();
                [[maybe_unused]] auto n = ::write(out[1], what.data(), what.size());
                code = 1;
            } catch (...) {
                code = 2;
            }
            ::_exit(code);
        }
        ::close(out[1]);
        ::close(go[0]);
        message_fd_ = out[0];
        start_fd_ = go[1];
    }
    ChildProcess(const ChildProcess&) = delete;
    ChildProcess& operator=(const ChildProcess&) = delete;
    ~ChildProcess() {
        if (!reaped_) {
            ::kill(pid_, SIGKILL);
            wait();
        }
        ::close(message_fd_);
        ::close(start_fd_);
    }

    void start() { [[maybe_unused]] auto n = ::write(start_fd_, "g", 1); }
    void kill() { ::kill(pid_, SIGKILL); }

    /// True when the child has ended (it is then reaped).
    bool finished() {
        if (reaped_) return true;
        int status = 0;
        if (::waitpid(pid_, &status, WNOHANG) == pid_) record(status);
        return reaped_;
    }
    /// Waits for the child to end; returns its raw wait status.
    int wait() {
        if (reaped_) return status_;
        int status = 0;
        while (::waitpid(pid_, &status, 0) < 0 && errno == EINTR) {
        }
        record(status);
        return status_;
    }
    bool exitedNormally() { return WIFEXITED(wait()) && WEXITSTATUS(status_) == 0; }
    bool killedBySignal() { return WIFSIGNALED(wait()); }
    /// What the child's body threw, if anything (read once the child has ended).
    std::string message() {
        wait();
        std::string text;
        char buffer[512];
        ssize_t n = 0;
        while ((n = ::read(message_fd_, buffer, sizeof buffer)) > 0) text.append(buffer, n);
        return text;
    }

  private:
    void record(int status) {
        status_ = status;
        reaped_ = true;
    }
    pid_t pid_ = -1;
    int message_fd_ = -1;
    int start_fd_ = -1;
    int status_ = 0;
    bool reaped_ = false;
};

} // namespace atollog::test
