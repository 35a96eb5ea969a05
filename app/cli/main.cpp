// cyclewright-cli: command-line front on the Cyclewright core.
#include "verbs.h"

#include <exception>
#include <iostream>

int main(int argc, char** argv) {
  // runCommandLine catches everything a verb throws; this catches what is left (e.g. copying argv).
  try {
    std::vector<std::string> words(argv + 1, argv + argc);
    return cw::cli::runCommandLine(words, std::cout, std::cerr);
  } catch (const std::exception& e) {
    std::cerr << "cyclewright-cli: internal error: " << e.what() << '\n';
  } catch (...) {
    std::cerr << "cyclewright-cli: internal error\n";
  }
  return cw::cli::kExitInternal;
}
