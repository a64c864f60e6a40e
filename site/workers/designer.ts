// The designer's Web Worker: one design per worker (the page ends it to cancel). It runs the
// generator's own modules (generator/browser/designJob.ts) off the page's thread.
import { InputError } from "../../generator/errors";
import { runDesignJob, type JobMessage } from "../../generator/browser/designJob";
import type { DesignRequest } from "../../generator/design/request";

const post = (m: JobMessage) => (self as unknown as Worker).postMessage(m);

self.onmessage = async (e: MessageEvent<{ request: DesignRequest }>) => {
  try {
    await runDesignJob(e.data.request, post);
  } catch (err) {
    const input = err instanceof InputError;
    post({ type: "error", message: input ? err.message : `The design stopped on an internal error: ${err instanceof Error ? err.message : String(err)}`, input });
  }
};
