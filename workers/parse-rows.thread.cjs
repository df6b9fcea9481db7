// Entry of the parse thread: load TypeScript support (tsx) in this thread, whatever
// the parent process was started with, then run workers/parse-rows.thread.ts.
require("tsx/cjs/api").register();
require("./parse-rows.thread.ts");
