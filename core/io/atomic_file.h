#pragma once
// Replacing a file's contents atomically (POSIX): readers see the old file or the new one,
// never a part; a crash leaves the old file.

#include <string>
#include <string_view>

namespace cw::io {

/// Writes contents to a temporary file in the target's folder, flushes and syncs it, renames it
/// over the target (a symbolic link is followed; an existing file's permissions are kept) and
/// syncs the folder. On failure removes the temporary file, leaves the target as it was, and
/// throws cw::InvalidInput "<path>: cannot write: <reason>".
void writeFileAtomically(const std::string& path, std::string_view contents);

}  // namespace cw::io
