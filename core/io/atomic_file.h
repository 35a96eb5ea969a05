#pragma once
// Replacing a file's contents atomically (POSIX): readers see the old file or the new one,
// never a part; a crash leaves the old file.
//
// The temporary file of a write is ".<name>.tmp-<pid>-<n>" in the target's folder (<pid> the
// writing process, <n> a counter); a process killed between writing and renaming leaves it
// behind, and removeStaleTemporaries() removes it later.

#include <cstddef>
#include <functional>
#include <string>
#include <string_view>

namespace cw::io {

/// Writes contents to a temporary file in the target's folder, flushes and syncs it, renames it
/// over the target (a symbolic link is followed; an existing file's permissions are kept) and
/// syncs the folder. On failure removes the temporary file, leaves the target as it was, and
/// throws cw::InvalidInput "<path>: cannot write: <reason>".
void writeFileAtomically(const std::string& path, std::string_view contents);

/// The same, calling beforeRename() once the temporary file is written, synced and closed, just
/// before it is renamed over the target: a seam for tests that stop a process at that moment.
/// An exception from beforeRename() removes the temporary file, leaves the target and propagates.
void writeFileAtomically(const std::string& path, std::string_view contents,
                         const std::function<void()>& beforeRename);

/// Removes, in `folder`, the temporary files writeFileAtomically() left for the file called
/// `fileName` (".<fileName>.tmp-<pid>-<n>"), or for any file when `fileName` is empty, whose
/// writing process is gone (kill(pid, 0) fails with ESRCH). Temporaries of a running process
/// (or one we may not signal) and every other file are kept. Errors (a folder that cannot be
/// read, a file that cannot be removed) are ignored: it is a clean-up. Returns how many it removed.
std::size_t removeStaleTemporaries(const std::string& folder, const std::string& fileName = {});

}  // namespace cw::io
