/** PostgreSQL twin of 0017: the desk that holds a job's open working copy, and who is typing there. */
export const version0017 = `
  ALTER TABLE job_working_revisions ADD COLUMN desk text NOT NULL DEFAULT '';
  ALTER TABLE job_working_revisions ADD COLUMN made_by text NOT NULL DEFAULT '';
`;
