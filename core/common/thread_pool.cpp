#include "common/thread_pool.h"

#include <algorithm>
#include <atomic>

namespace cw {

struct ThreadPool::Loop {
  std::size_t count = 0;
  const std::function<void(std::size_t)>* task = nullptr;
  std::stop_token stop;
  std::atomic<std::size_t> next{0};
  std::atomic<std::size_t> ran{0};
  std::atomic<bool> failed{false};
  std::exception_ptr error;  // the first failure, written under ThreadPool::mutex_
};

unsigned ThreadPool::hardwareThreads() noexcept {
  return std::max(1u, std::thread::hardware_concurrency());
}

ThreadPool::ThreadPool(unsigned threadCount) {
  const unsigned n = threadCount == 0 ? hardwareThreads() : threadCount;
  workers_.reserve(n);
  for (unsigned i = 0; i < n; ++i)
    workers_.emplace_back([this](std::stop_token shutdown) { work(shutdown); });
}

ThreadPool::~ThreadPool() {
  for (auto& worker : workers_) worker.request_stop();
  wake_.notify_all();
  // std::jthread joins on destruction.
}

void ThreadPool::runIndices(Loop& loop) {
  while (!loop.failed.load(std::memory_order_relaxed) && !loop.stop.stop_requested()) {
    const std::size_t i = loop.next.fetch_add(1, std::memory_order_relaxed);
    if (i >= loop.count) return;
    try {
      (*loop.task)(i);
      loop.ran.fetch_add(1, std::memory_order_relaxed);
    } catch (...) {
      std::lock_guard lock(mutex_);
      if (!loop.error) loop.error = std::current_exception();
      loop.failed.store(true, std::memory_order_relaxed);
    }
  }
}

void ThreadPool::work(std::stop_token shutdown) {
  unsigned seen = 0;
  while (true) {
    Loop* loop = nullptr;
    {
      std::unique_lock lock(mutex_);
      if (!wake_.wait(lock, shutdown, [&] { return loop_ != nullptr && generation_ != seen; })) return;
      seen = generation_;
      loop = loop_;
      ++busy_;
    }
    runIndices(*loop);
    {
      std::lock_guard lock(mutex_);
      --busy_;
    }
    finished_.notify_all();
  }
}

std::size_t ThreadPool::parallelFor(std::size_t count, const std::function<void(std::size_t)>& task,
                                    std::stop_token stop) {
  if (count == 0) return 0;
  std::lock_guard serial(loopMutex_);
  Loop loop;
  loop.count = count;
  loop.task = &task;
  loop.stop = std::move(stop);
  {
    std::lock_guard lock(mutex_);
    loop_ = &loop;
    ++generation_;
  }
  wake_.notify_all();
  {
    // Done when every index has been handed out (or the loop was stopped) and no worker is
    // still inside it. A worker that wakes late finds no index left and leaves at once.
    std::unique_lock lock(mutex_);
    finished_.wait(lock, [&] {
      const bool handedOut =
          loop.next.load() >= loop.count || loop.failed.load() || loop.stop.stop_requested();
      return handedOut && busy_ == 0;
    });
    loop_ = nullptr;
  }
  if (loop.error) std::rethrow_exception(loop.error);
  return loop.ran.load();
}

}  // namespace cw
