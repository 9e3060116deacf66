/**
 * PostgreSQL twin of 0021: the job change notice (0015) goes out once per statement that writes jobs, not once
 * per job row with the job's id. The id was never read: a desk that hears the notice reads its list again. A
 * 100 000-job import sent 100 000 distinct notices, each queued until the commit, and cost 589 ms more than
 * none at all; one notice per statement costs next to nothing. PostgreSQL delivers it at the commit, as before,
 * and folds identical notices of one transaction into one.
 */
export const version0021 = `
  DROP TRIGGER jobs_changed ON jobs;
  DROP FUNCTION coilwright_job_changed();
  CREATE FUNCTION coilwright_jobs_changed() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    PERFORM pg_notify('coilwright_jobs', '');
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_changed AFTER INSERT OR UPDATE OR DELETE ON jobs FOR EACH STATEMENT EXECUTE FUNCTION coilwright_jobs_changed();
`;
