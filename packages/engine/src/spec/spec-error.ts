/**
 * The one error the engine throws for a spec it cannot run. `field` is the path of the
 * offending input written the way users write it ("model.climate.ecs.sd",
 * "pathways[1].agents.co2.ppm"); the message starts with that path so it reads on its own.
 */
export class SpecError extends Error {
  readonly field: string;

  constructor(field: string, problem: string) {
    super(field ? `${field} ${problem}` : problem);
    this.name = "SpecError";
    this.field = field;
  }
}

/** Thrown when a caller's shouldCancel() answered true; nothing is returned. */
export class RunCancelledError extends Error {
  constructor() {
    super("run cancelled");
    this.name = "RunCancelledError";
  }
}
