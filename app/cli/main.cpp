// cyclewright-cli: command-line front on the Cyclewright core.
#include "verbs.h"

#include <iostream>

int main(int argc, char** argv) {
  std::vector<std::string> words(argv + 1, argv + argc);
  return cw::cli::runCommandLine(words, std::cout, std::cerr);
}
