/** PostgreSQL twin of 0013: the open working revision of a job (autosaves in place until the session ends). */
export const version0013 = `
  CREATE TABLE job_working_revisions (
    job_id bigint PRIMARY KEY REFERENCES jobs(id) ON DELETE CASCADE,
    base_revision bigint NOT NULL CHECK (base_revision >= 1),
    opened_at text NOT NULL,
    saved_at text NOT NULL,
    saves bigint NOT NULL DEFAULT 1 CHECK (saves >= 1)
  );
`;
