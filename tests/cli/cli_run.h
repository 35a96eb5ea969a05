#pragma once
// Runs cyclewright-cli in-process (the same dispatcher as the binary) for the CLI suites.

#include "verbs.h"

#include <QByteArray>
#include <QJsonDocument>
#include <QJsonObject>

#include <sstream>
#include <string>
#include <vector>

namespace cw::test {

struct CliRun {
  int status;
  std::string out;
  std::string err;
};

inline CliRun runCli(const std::vector<std::string>& words) {
  std::ostringstream out, err;
  const int status = cw::cli::runCommandLine(words, out, err);
  return {status, out.str(), err.str()};
}

/// The JSON object a run printed (empty when it printed none).
inline QJsonObject jsonOf(const CliRun& r) {
  return QJsonDocument::fromJson(QByteArray::fromStdString(r.out)).object();
}

}  // namespace cw::test
