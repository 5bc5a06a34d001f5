import { parentPort } from "node:worker_threads";
import { WARM_MEMBERS, warmKernels } from "../ensemble/warm-kernels.js";
import { PassParticipant, runBlocking } from "./pass-participant.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/**
 * One worker of the parallel runner: takes its part of each pass (pass-participant.ts),
 * blocking on the shared counters while it waits for the other threads.
 */

let participant: PassParticipant;
let control: Extract<ToWorker, { kind: "plan" }>["control"];

const port = parentPort!;
const send = (message: FromWorker) => port.postMessage(message);

port.on("message", (message: ToWorker) => {
  try {
    if (message.kind === "plan") {
      const { plan } = message;
      control = message.control;
      participant = new PassParticipant(plan, control);
      // Each worker warms its kernels on its own few members (warm-kernels.ts), inside the run's time.
      const lo = Math.min(plan.members, message.worker * WARM_MEMBERS);
      warmKernels(plan, lo, Math.min(plan.members, lo + WARM_MEMBERS));
      send({ kind: "ready" });
    } else if (message.kind === "baseline" || message.kind === "report") {
      const pass = message.kind === "baseline" ? participant.baseline(message.pathway) : participant.report(message);
      const finished = runBlocking(control, pass);
      send(finished ? { kind: "done", ...participant.takeTimes() } : { kind: "cancelled" });
    } else if (message.kind === "stop") {
      port.close();
    }
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    send({ kind: "failed", message: e.message, ...(e.stack ? { stack: e.stack } : {}) });
  }
});
