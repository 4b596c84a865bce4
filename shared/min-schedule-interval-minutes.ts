/**
 * The shortest time a schedule may leave between two runs. A run of the demo "complex.js nightly"
 * plan (50 shards) takes ~49 s of wall time today and a plan over the whole catalogue several
 * minutes; each run stores its failing points (the failure table is sized for ~1,000,000) and may
 * mail its subscribers. Quarter-hourly is 96 runs a day, more than anyone reads, and leaves each run
 * time to finish before the next; "Run now" covers anything more urgent.
 */
export const MIN_SCHEDULE_INTERVAL_MINUTES = 15;
