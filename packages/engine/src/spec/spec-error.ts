/**
 * The one error the engine throws for a spec it cannot run. `field` is the path of the
 * offending input written the way users write it ("model.climate.ecs.sd",
 * "pathways[1].agents.co2.ppm"); the message starts with that path so it reads on its own.
 */
export class SpecError extends Error {
  readonly field: string;

  constructor(field: string, problem: string) {
    // A problem that already opens with the field ("baseline 1700–1720 lies outside …") stands alone.
    super(field && !problem.startsWith(`${field} `) ? `${field} ${problem}` : problem);
    this.name = "SpecError";
    this.field = field;
  }

  /**
   * Re-throws a primitive's RangeError (whose message already names the parameter, e.g.
   * "model.climate.ecs.sd must be > 0") as a SpecError under `field`.
   */
  static fromRangeError(field: string, error: unknown): SpecError {
    const message = error instanceof Error ? error.message : String(error);
    const match = /^(\S+) (.*)$/s.exec(message);
    if (match && match[1]!.startsWith(field)) {
      const spec = new SpecError(match[1]!, match[2]!);
      return spec;
    }
    return new SpecError(field, message);
  }
}

/** Thrown when a caller's shouldCancel() answered true (or its signal aborted). */
export class RunCancelledError extends Error {
  constructor() {
    super("run cancelled");
    this.name = "RunCancelledError";
  }
}
