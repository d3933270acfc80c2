// A sweep worker for sweepWorkerPool.test.ts: the real one (kernel-lib/dist), except that while
// ISOCHOR_TEST_CRASH_WORKER is "1" in the environment it was started with, the thread exits
// with code 7 on its first range (a crash in the middle of a sweep). The listener below is
// attached before the real worker's, so it sees the range first.
import { parentPort } from "node:worker_threads";

if (process.env.ISOCHOR_TEST_CRASH_WORKER === "1") {
  parentPort.on("message", (m) => {
    if (m.type === "range") process.exit(7);
  });
}
await import(new URL("../../../kernel-lib/dist/parallel/sweepWorker.js", import.meta.url).href);
