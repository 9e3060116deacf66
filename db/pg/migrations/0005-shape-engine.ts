/** PostgreSQL twin of 0005: the engine version behind each job's search numbers. */
export const version0005 = `
  ALTER TABLE jobs ADD COLUMN shape_engine bigint CHECK (shape_engine >= 1);
  CREATE INDEX jobs_by_shape_engine ON jobs (shape_engine);
`;
