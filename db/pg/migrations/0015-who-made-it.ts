/**
 * PostgreSQL twin of 0015: who made each revision, issued quote and first-off record. A change notice
 * (NOTIFY coilwright_jobs, the job id as payload) goes out with every committed job change, so an open job
 * list on another desk refreshes without polling the table.
 */
export const version0015 = `
  ALTER TABLE job_revisions ADD COLUMN made_by text NOT NULL DEFAULT '';
  ALTER TABLE quotes ADD COLUMN made_by text NOT NULL DEFAULT '';
  ALTER TABLE first_off_records ADD COLUMN made_by text NOT NULL DEFAULT '';

  CREATE FUNCTION coilwright_job_changed() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    PERFORM pg_notify('coilwright_jobs', coalesce(NEW.id, OLD.id)::text);
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_changed AFTER INSERT OR UPDATE OR DELETE ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_changed();
`;
