// Writes the case format's reference from the registry of parameters into docs/: the JSON Schema
// (case-schema.json, whole) and the generated blocks of case-format.md (io/case_format_docs.h).
// Run it through the CMake target: cmake --build --preset default --target case_format_docs
#include "io/case_format_docs.h"
#include "common/error.h"
#include "io/atomic_file.h"
#include "io/json_document.h"

#include <exception>
#include <iostream>

int main(int argc, char** argv) {
  if (argc != 2) {
    std::cerr << "usage: case_format_docs DOCS_FOLDER\n";
    return 2;
  }
  try {
    const std::string docs = argv[1];
    const std::string format = docs + "/case-format.md";
    cw::io::writeFileAtomically(docs + "/case-schema.json", cw::io::caseSchemaText());
    cw::io::writeFileAtomically(format,
                                cw::io::withGeneratedBlocks(cw::io::readDocumentFile(format, "case format"),
                                                            cw::io::caseFormatBlocks()));
    std::cout << "case_format_docs: wrote " << docs << "/case-schema.json and the tables of " << format
              << "\n";
    return 0;
  } catch (const std::exception& e) {
    std::cerr << "case_format_docs: " << e.what() << "\n";
    return 1;
  }
}
