import { parentPort } from "node:worker_threads";
import { w1Spec } from "../bench/w1-spec.js";
import { PlanSetup } from "../ensemble/plan-setup.js";
import { preparePlan } from "../ensemble/prepare-plan.js";
import { WARM_MEMBERS, warmKernels } from "../ensemble/warm-kernels.js";
import { PassParticipant, runBlocking } from "./pass-participant.js";
import type { FromWorker, ToWorker } from "./worker-messages.js";

/**
 * One helper thread of the parallel runner, kept between runs (engine-thread-pool.ts): takes
 * its part of each set-up and pass (pass-participant.ts), blocking on the shared counters
 * while it waits for the other threads.
 */

let participant: PassParticipant | null = null;
let setup: PlanSetup | null = null;
let control: Extract<ToWorker, { kind: "setup" }>["control"] | null = null;

const port = parentPort!;
const send = (message: FromWorker) => port.postMessage(message);

port.on("message", (message: ToWorker) => {
  try {
    if (message.kind === "release") {
      participant = setup = control = null;
      return;
    }
    if (message.kind === "setup") {
      const { plan } = message;
      control = message.control;
      participant = new PassParticipant(plan, control);
      setup = new PlanSetup(message.spec, { inputs: plan.inputs, columns: plan.columns, climate: plan.climate, tcr: plan.tcr, memory: plan.kernels.memory }, message.clean);
      if (!message.sample) {
        send({ kind: "done", simulateSeconds: 0, summariseSeconds: 0 });
        return;
      }
    }
    if (!participant || !setup || !control) throw new Error(`an engine thread got a ${message.kind} order before a run's set-up`);
    const pass =
      message.kind === "setup"
        ? participant.sample(setup)
        : message.kind === "climate"
          ? participant.buildClimates(setup, message.variant)
          : message.kind === "baseline"
            ? participant.baseline(message.pathway)
            : participant.report(message);
    const finished = runBlocking(control, pass);
    send(finished ? { kind: "done", ...participant.takeTimes() } : { kind: "cancelled" });
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    send({ kind: "failed", message: e.message, ...(e.stack ? { stack: e.stack } : {}) });
  }
});

// Warm up once, before the first run (warm-kernels.ts says why): on a small ensemble of this
// thread's own, so no run's numbers are touched.
warmKernels(preparePlan(w1Spec(WARM_MEMBERS)).plan, 0, WARM_MEMBERS);
send({ kind: "booted" });
