#include "startup/guarded_main.h"

#include "common/error.h"

#include <exception>
#include <new>
#include <string>

namespace cw::gui {

namespace {

/// The text on one line: line breaks of a multi-line message become "; ".
std::string oneLine(std::string text) {
  for (std::size_t at = text.find('\n'); at != std::string::npos; at = text.find('\n', at + 2))
    text.replace(at, 1, "; ");
  return text;
}

}  // namespace

int runGuarded(const std::function<int()>& work, std::ostream& err) {
  try {
    return work();
  } catch (const Error& e) {
    if (e.code() == ErrorCode::InvalidInput || e.code() == ErrorCode::OutOfRange) {
      err << "cyclewright: " << oneLine(e.what()) << '\n';
      return 2;
    }
    err << "cyclewright: internal error: " << oneLine(e.what()) << '\n';
  } catch (const std::bad_alloc&) {
    err << "cyclewright: out of memory\n";
  } catch (const std::exception& e) {
    err << "cyclewright: internal error: " << oneLine(e.what()) << '\n';
  } catch (...) {
    err << "cyclewright: internal error: an exception of unknown type\n";
  }
  return 1;
}

}  // namespace cw::gui
