#pragma once
// A fixed set of worker threads that run index-parallel loops (trade studies). Standard C++20
// only: std::jthread workers waiting on a condition variable for the next loop.
//
//   ThreadPool pool(2);
//   pool.parallelFor(n, [&](std::size_t i) { results[i] = evaluate(i); }, stop);
//
// Each index is run exactly once, by some worker; results written to slot i keep the output
// order whatever the thread count or timing. A stop request (std::stop_source) ends the loop
// early: no new index starts, running ones finish.

#include <condition_variable>
#include <cstddef>
#include <exception>
#include <functional>
#include <mutex>
#include <stop_token>
#include <thread>
#include <vector>

namespace cw {

class ThreadPool {
 public:
  /// threadCount 0 means one worker per hardware thread (at least one).
  explicit ThreadPool(unsigned threadCount = 0);
  ~ThreadPool();
  ThreadPool(const ThreadPool&) = delete;
  ThreadPool& operator=(const ThreadPool&) = delete;

  unsigned threadCount() const noexcept { return static_cast<unsigned>(workers_.size()); }

  /// Runs task(i) for every i in [0, count) on the workers and waits for them. Returns how many
  /// indices ran (count, unless stop was requested). If a task throws, no new index starts and
  /// the first exception is rethrown here once every worker is idle. One loop at a time: calls
  /// from several threads are serialised.
  std::size_t parallelFor(std::size_t count, const std::function<void(std::size_t)>& task,
                          std::stop_token stop = {});

  /// One worker per hardware thread, at least one.
  static unsigned hardwareThreads() noexcept;

 private:
  struct Loop;
  void work(std::stop_token shutdown);
  void runIndices(Loop& loop);

  std::mutex loopMutex_;  // serialises parallelFor callers
  std::mutex mutex_;      // guards the members below
  std::condition_variable_any wake_;
  std::condition_variable finished_;
  Loop* loop_ = nullptr;
  unsigned generation_ = 0;
  unsigned busy_ = 0;
  std::vector<std::jthread> workers_;
};

}  // namespace cw
