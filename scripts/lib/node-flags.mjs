// V8 flags for the processes that measure photos: the server (which grades in-process by
// default) and `npm run worker`. backend/package.json's `start` and `worker` scripts carry the
// same flag; a deployment that starts `node dist/main.js` or `node dist/worker.js` itself
// should pass it too.
//
// --initial-old-space-size=64: V8 otherwise starts a process with a small old-generation limit
// and, in a process measuring photos back to back, settles into a full collection for nearly
// every photo; each one drops the optimised code of closures made per call (jsQR's, array
// callbacks), which V8 then compiles again on a background thread. That cost about 30 ms of CPU
// per 12 MP photo and kept two processes on two cores at ~1.5× one process's throughput
// (docs/measurement.md, "Two processes at once"). With the flag: a full collection every ~70
// photos, and two processes ~2×. Memory: the heap may hold up to ~64 MB before collecting.
export const serviceNodeFlags = ['--initial-old-space-size=64'];
