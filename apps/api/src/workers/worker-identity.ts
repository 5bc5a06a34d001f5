import os from "node:os";

/**
 * Worker ids are `<host>:<pid>:worker-<slot>` (what `locked_by` holds). From that a process can
 * tell, without asking anyone, that a job was held by a process on ITS OWN host that no longer
 * exists — a crash before this start. A job held on another host is judged by its heartbeat only.
 */
export const processWorkerPrefix = (): string => `${os.hostname()}:${process.pid}`;

export const workerIdFor = (prefix: string, slot: number): string => `${prefix}:worker-${slot}`;

export function lockedByDeadLocalProcess(lockedBy: string): boolean {
  const match = /^(.*):(\d+):worker-\d+$/.exec(lockedBy);
  if (!match || match[1] !== os.hostname()) return false;
  const pid = Number(match[2]);
  if (pid === process.pid) return false;
  try {
    process.kill(pid, 0); // signal 0 only checks that the process exists
    return false;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "ESRCH";
  }
}
