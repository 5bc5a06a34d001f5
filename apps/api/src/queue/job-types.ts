/**
 * The kinds of job the queue carries. Here, apart from the services that enqueue them and the
 * workers that run them, so neither side imports the other just for a name.
 */
export const RUN_JOB_TYPE = "ensemble-run";
export const REPLAY_JOB_TYPE = "ensemble-replay";
