#include "io/atomic_file.h"

#include "common/error.h"

#include <fcntl.h>
#include <signal.h>
#include <sys/stat.h>
#include <unistd.h>

#include <algorithm>
#include <atomic>
#include <cerrno>
#include <charconv>
#include <filesystem>
#include <system_error>

namespace cw::io {

namespace {

[[noreturn]] void fail(const std::string& path, int error) {
  throw InvalidInput(path, "cannot write: " + std::generic_category().message(error));
}

/// Writes all of contents, retrying short writes and interruptions; false on error (errno set).
bool writeAll(int fd, std::string_view contents) {
  while (!contents.empty()) {
    const ssize_t n = ::write(fd, contents.data(), contents.size());
    if (n < 0) {
      if (errno == EINTR) continue;
      return false;
    }
    contents.remove_prefix(static_cast<std::size_t>(n));
  }
  return true;
}

void syncFolder(const std::filesystem::path& folder) {
  // Makes the rename durable; a failure here cannot undo the rename, so it is not reported.
  const int fd = ::open(folder.empty() ? "." : folder.c_str(), O_RDONLY | O_DIRECTORY | O_CLOEXEC);
  if (fd < 0) return;
  ::fsync(fd);
  ::close(fd);
}

/// ".<name>.tmp-": the start of every temporary file name for a target called name.
std::string temporaryPrefix(const std::string& name) {
  return "." + name + ".tmp-";
}

/// Opens a new temporary file beside target; throws as writeFileAtomically does.
int openTemporary(const std::string& path, const std::filesystem::path& target,
                  std::filesystem::path& temporary) {
  static std::atomic<unsigned> counter{0};
  const std::filesystem::path folder = target.parent_path();
  for (int attempt = 0; attempt < 100; ++attempt) {
    temporary = folder / (temporaryPrefix(target.filename().string()) + std::to_string(::getpid()) + "-" +
                          std::to_string(counter++));
    const int fd = ::open(temporary.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
    if (fd >= 0) return fd;
    if (errno != EEXIST) fail(path, errno);
  }
  fail(path, EEXIST);
}

/// Whether text is a non-empty run of decimal digits.
bool allDigits(std::string_view text) {
  return !text.empty() && std::all_of(text.begin(), text.end(), [](char c) { return c >= '0' && c <= '9'; });
}

/// The writing process of a temporary called `name` (".<file>.tmp-<pid>-<n>", <file> = fileName
/// unless that is empty), or 0 when the name is not one.
pid_t writerOfTemporary(std::string_view name, const std::string& fileName) {
  const std::size_t tmp = name.rfind(".tmp-");
  if (tmp == std::string_view::npos || tmp < 2 || name.front() != '.') return 0;
  if (!fileName.empty() && name.substr(1, tmp - 1) != fileName) return 0;
  const std::string_view tail = name.substr(tmp + 5);  // "<pid>-<n>"
  const std::size_t dash = tail.find('-');
  if (dash == std::string_view::npos || !allDigits(tail.substr(dash + 1))) return 0;
  const std::string_view digits = tail.substr(0, dash);
  if (!allDigits(digits) || digits.size() > 9) return 0;  // pid_t holds nine digits
  pid_t pid = 0;
  std::from_chars(digits.data(), digits.data() + digits.size(), pid);
  return pid;
}

bool processIsGone(pid_t pid) {
  return ::kill(pid, 0) != 0 && errno == ESRCH;
}

}  // namespace

void writeFileAtomically(const std::string& path, std::string_view contents) {
  writeFileAtomically(path, contents, {});
}

void writeFileAtomically(const std::string& path, std::string_view contents,
                         const std::function<void()>& beforeRename) {
  namespace fs = std::filesystem;
  fs::path target(path);
  std::error_code ec;
  if (fs::is_symlink(target, ec)) {
    const fs::path resolved = fs::canonical(target, ec);
    if (!ec) target = resolved;
  }
  struct stat existing {};
  const bool exists = ::stat(target.c_str(), &existing) == 0;

  fs::path temporary;
  const int fd = openTemporary(path, target, temporary);
  int error = 0;
  // Keep the replaced file's permissions (best effort: a failure leaves the umask's).
  if (exists) static_cast<void>(::fchmod(fd, existing.st_mode & 07777));
  if (!writeAll(fd, contents) || ::fsync(fd) != 0) error = errno;
  if (::close(fd) != 0 && error == 0) error = errno;
  if (error == 0 && beforeRename) {
    try {
      beforeRename();
    } catch (...) {
      ::unlink(temporary.c_str());
      throw;
    }
  }
  if (error == 0 && ::rename(temporary.c_str(), target.c_str()) != 0) error = errno;
  if (error != 0) {
    ::unlink(temporary.c_str());
    fail(path, error);
  }
  syncFolder(target.parent_path());
}

std::size_t removeStaleTemporaries(const std::string& folder, const std::string& fileName) {
  namespace fs = std::filesystem;
  std::error_code ec;
  std::size_t removed = 0;
  for (fs::directory_iterator it(folder, ec), end; !ec && it != end; it.increment(ec)) {
    const pid_t writer = writerOfTemporary(it->path().filename().string(), fileName);
    std::error_code fileError;
    if (writer <= 0 || it->symlink_status(fileError).type() != fs::file_type::regular) continue;
    if (processIsGone(writer) && fs::remove(it->path(), fileError)) ++removed;
  }
  return removed;
}

}  // namespace cw::io
