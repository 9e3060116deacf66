/**
 * PostgreSQL twin of 0010: the lines of a quotation, every quote already issued given its one line, as
 * immutable as the quote; `quotes.line_count`, written with the quote, closes it to lines added later.
 */
export const version0010 = `
  ALTER TABLE quotes ADD COLUMN line_count bigint NOT NULL DEFAULT 1 CHECK (line_count >= 1);

  CREATE TABLE quote_lines (
    quote_id bigint NOT NULL REFERENCES quotes(id),
    line bigint NOT NULL CHECK (line >= 1),
    job_id bigint NOT NULL REFERENCES jobs(id),
    job_revision bigint NOT NULL,
    job text NOT NULL CHECK (coilwright_json_valid(job)),
    spec text NOT NULL CHECK (coilwright_json_valid(spec)),
    prices text NOT NULL CHECK (coilwright_json_valid(prices)),
    quantity_breaks text NOT NULL CHECK (coilwright_json_valid(quantity_breaks)),
    PRIMARY KEY (quote_id, line),
    UNIQUE (quote_id, job_id)
  );
  CREATE INDEX quote_lines_by_job ON quote_lines (job_id, quote_id);

  INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
    SELECT id, 1, job_id, job_revision, job, spec, prices, quantity_breaks FROM quotes;

  CREATE TRIGGER quote_lines_refuse_update BEFORE UPDATE ON quote_lines
    FOR EACH ROW EXECUTE FUNCTION coilwright_refuse('a line of an issued quote cannot be changed: issue a new quote instead');
  CREATE TRIGGER quote_lines_refuse_delete BEFORE DELETE ON quote_lines
    FOR EACH ROW EXECUTE FUNCTION coilwright_refuse('a line of an issued quote cannot be deleted');

  CREATE FUNCTION coilwright_quote_line_within() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF NEW.line > coalesce((SELECT line_count FROM quotes WHERE id = NEW.quote_id), 0) THEN
      RAISE EXCEPTION 'an issued quote has the lines it was issued with: issue a new quote to add one' USING ERRCODE = 'restrict_violation';
    END IF;
    RETURN NEW;
  END $$;
  CREATE TRIGGER quote_lines_within_quote BEFORE INSERT ON quote_lines
    FOR EACH ROW EXECUTE FUNCTION coilwright_quote_line_within();
`;
