#include "io/atomic_file.h"

#include "common/error.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <atomic>
#include <cerrno>
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

}  // namespace

void writeFileAtomically(const std::string& path, std::string_view contents) {
  namespace fs = std::filesystem;
  fs::path target(path);
  std::error_code ec;
  if (fs::is_symlink(target, ec)) {
    const fs::path resolved = fs::canonical(target, ec);
    if (!ec) target = resolved;
  }
  struct stat existing {};
  const bool exists = ::stat(target.c_str(), &existing) == 0;

  static std::atomic<unsigned> counter{0};
  const fs::path folder = target.parent_path();
  fs::path temporary;
  int fd = -1;
  for (int attempt = 0; attempt < 100 && fd < 0; ++attempt) {
    temporary = folder / ("." + target.filename().string() + ".tmp-" + std::to_string(::getpid()) + "-" +
                          std::to_string(counter++));
    fd = ::open(temporary.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
    if (fd < 0 && errno != EEXIST) fail(path, errno);
  }
  if (fd < 0) fail(path, EEXIST);

  int error = 0;
  // Keep the replaced file's permissions (best effort: a failure leaves the umask's).
  if (exists) static_cast<void>(::fchmod(fd, existing.st_mode & 07777));
  if (!writeAll(fd, contents) || ::fsync(fd) != 0) error = errno;
  if (::close(fd) != 0 && error == 0) error = errno;
  if (error == 0 && ::rename(temporary.c_str(), target.c_str()) != 0) error = errno;
  if (error != 0) {
    ::unlink(temporary.c_str());
    fail(path, error);
  }
  syncFolder(folder);
}

}  // namespace cw::io
