#include "io/json_document.h"

#include "common/error.h"
#include "common/text.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <system_error>

namespace cw::io {

using nlohmann::json;

namespace {

/// Closes a file descriptor when it goes out of scope.
class FileDescriptor {
 public:
  explicit FileDescriptor(int fd) : fd_(fd) {}
  ~FileDescriptor() {
    if (fd_ >= 0) ::close(fd_);
  }
  FileDescriptor(const FileDescriptor&) = delete;
  FileDescriptor& operator=(const FileDescriptor&) = delete;
  int get() const { return fd_; }

 private:
  int fd_;
};

std::string kindOfFile(mode_t mode) {
  if (S_ISDIR(mode)) return "is a folder, not a file";
  if (S_ISFIFO(mode)) return "is a FIFO (named pipe), not a regular file";
  if (S_ISCHR(mode) || S_ISBLK(mode)) return "is a device, not a regular file";
  if (S_ISSOCK(mode)) return "is a socket, not a regular file";
  return "is not a regular file";
}

std::string sizeText(std::size_t bytes) {
  return std::to_string(bytes) + " bytes";
}

/// "line L, column C" of a byte offset (columns count bytes, from 1).
std::string positionText(std::string_view text, std::size_t offset) {
  std::size_t line = 1, column = 1;
  for (std::size_t i = 0; i < offset && i < text.size(); ++i) {
    if (text[i] == '\n') {
      ++line;
      column = 1;
    } else {
      ++column;
    }
  }
  return "line " + std::to_string(line) + ", column " + std::to_string(column);
}

/// Refuses NUL bytes (which the JSON library takes for the end of the input) and nesting deeper
/// than the limit, in one pass that follows strings and their escapes.
void checkText(std::string_view text, const std::string& where) {
  int depth = 0;
  bool inString = false, escaped = false;
  for (std::size_t i = 0; i < text.size(); ++i) {
    const char c = text[i];
    if (c == '\0')
      throw InvalidInput(where, "not valid JSON: a NUL byte at " + positionText(text, i) +
                                    " (a JSON document is text; nothing may follow it)");
    if (inString) {
      if (escaped)
        escaped = false;
      else if (c == '\\')
        escaped = true;
      else if (c == '"')
        inString = false;
    } else if (c == '"') {
      inString = true;
    } else if (c == '[' || c == '{') {
      if (++depth > kMaxDocumentNesting)
        throw InvalidInput(where, "arrays and objects nested more than " +
                                      std::to_string(kMaxDocumentNesting) + " levels deep at " +
                                      positionText(text, i) + " (a case file nests 2 levels)");
    } else if (c == ']' || c == '}') {
      --depth;
    }
  }
}

/// The JSON library's message without its "[json.exception.<kind>.<id>] " prefix, as an excerpt.
std::string libraryMessage(const json::exception& e) {
  std::string_view text = e.what();
  const auto end = text.find("] ");
  if (text.rfind("[json.exception.", 0) == 0 && end != std::string_view::npos) text.remove_prefix(end + 2);
  return excerpt(text, 160);
}

}  // namespace

std::string readDocumentFile(const std::string& path, std::string_view kind) {
  const std::string cannot = "cannot read " + std::string(kind) + ": ";
  // O_NONBLOCK: opening a FIFO must not wait for a writer; the type is checked on the open file.
  const FileDescriptor fd(::open(path.c_str(), O_RDONLY | O_NONBLOCK | O_CLOEXEC | O_NOCTTY));
  if (fd.get() < 0) throw InvalidInput(path, cannot + std::generic_category().message(errno));
  struct stat info {};
  if (::fstat(fd.get(), &info) != 0)
    throw InvalidInput(path, cannot + std::generic_category().message(errno));
  if (!S_ISREG(info.st_mode)) throw InvalidInput(path, cannot + kindOfFile(info.st_mode));
  const auto tooLarge = [&](const std::string& size) {
    return InvalidInput(path, cannot + "it holds " + size + ", more than the limit of 4 MiB (" +
                                  sizeText(kMaxDocumentBytes) + ")");
  };
  if (static_cast<std::uintmax_t>(info.st_size) > kMaxDocumentBytes)
    throw tooLarge(sizeText(static_cast<std::size_t>(info.st_size)));

  // Read at most one byte past the limit: a file may grow while it is read.
  std::string bytes(static_cast<std::size_t>(info.st_size) + 1, '\0');
  std::size_t size = 0;
  while (true) {
    if (size == bytes.size()) {
      if (bytes.size() > kMaxDocumentBytes) throw tooLarge("more than " + sizeText(kMaxDocumentBytes));
      bytes.resize(std::min(kMaxDocumentBytes + 1, 2 * bytes.size()));
    }
    const ssize_t n = ::read(fd.get(), bytes.data() + size, bytes.size() - size);
    if (n < 0 && errno == EINTR) continue;
    if (n < 0) throw InvalidInput(path, cannot + std::generic_category().message(errno));
    if (n == 0) break;
    size += static_cast<std::size_t>(n);
  }
  bytes.resize(size);
  return bytes;
}

json parseDocumentText(std::string_view text, const std::string& where,
                       const json::parser_callback_t& callback) {
  checkText(text, where);
  try {
    return json::parse(text.begin(), text.end(), callback);
  } catch (const json::out_of_range& e) {
    // Id 406: a number beyond the range of a double; the library names it, without a position.
    throw InvalidInput(where,
                       "not valid JSON: " + libraryMessage(e) + " (a number must be within +-1.8e308)");
  } catch (const json::exception& e) {
    throw InvalidInput(where, "not valid JSON: " + libraryMessage(e));
  }
}

std::string shortJson(const json& value) {
  // Strings from --set may hold invalid UTF-8: replace rather than throw, then cut to an excerpt.
  return excerpt(value.dump(-1, ' ', false, json::error_handler_t::replace), 60);
}

}  // namespace cw::io
