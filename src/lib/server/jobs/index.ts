// Public face of the job queue (pg-boss): queue names, start/stop, and sending or cancelling inside our own transactions.
export { jobNames, allJobNames, fieldCheckJobDataSchema, jobBudgetSeconds, jobExpireSeconds, JOB_RETRY_LIMIT, HOMING_MAX_SIMULATIONS, type JobName, type FieldCheckJobData } from './job-names';
export { createQueue, getQueue, stopQueue, type Boss, type QueueOptions } from './queue';
export { toBossDb, type BossDb } from './boss-db';
