import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Organisations, users, jobs, spools, spool revisions, audit events and the session
 * table. Enumerations are text + CHECK so adding a value is a one-line migration.
 * Composite foreign keys carry organisation_id so a row can never point at another
 * shop's row, whatever the application code does.
 */
export class InitialSchema1764626400000 implements MigrationInterface {
  name = 'InitialSchema1764626400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE organisation (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        slug text NOT NULL UNIQUE CHECK (slug ~ '^[a-z0-9][a-z0-9-]*$'),
        name text NOT NULL CHECK (length(name) BETWEEN 1 AND 200),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);

    await q.query(`
      CREATE TABLE app_user (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organisation_id uuid NOT NULL REFERENCES organisation (id),
        email text NOT NULL CHECK (email = lower(email) AND length(email) BETWEEN 3 AND 254),
        display_name text NOT NULL CHECK (length(display_name) BETWEEN 1 AND 120),
        password_hash text NOT NULL,
        role text NOT NULL CHECK (role IN ('admin', 'detailer', 'fabricator', 'inspector', 'viewer')),
        active boolean NOT NULL DEFAULT true,
        last_sign_in_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1 CHECK (version >= 1),
        UNIQUE (id, organisation_id)
      )`);
    await q.query(`CREATE UNIQUE INDEX app_user_org_email_key ON app_user (organisation_id, email)`);
    await q.query(`CREATE INDEX app_user_email_idx ON app_user (email)`);

    await q.query(`
      CREATE TABLE job (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organisation_id uuid NOT NULL REFERENCES organisation (id),
        number text NOT NULL CHECK (length(number) BETWEEN 1 AND 40),
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 200),
        client text NOT NULL CHECK (length(client) BETWEEN 1 AND 200),
        site text NOT NULL DEFAULT '',
        units text NOT NULL CHECK (units IN ('mm', 'ft-in')),
        spec jsonb NOT NULL CHECK (jsonb_typeof(spec) = 'object'),
        status text NOT NULL DEFAULT 'active' CHECK (status IN ('active', 'on-hold', 'complete', 'archived')),
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1 CHECK (version >= 1),
        UNIQUE (id, organisation_id),
        CHECK ((status = 'archived') = (archived_at IS NOT NULL))
      )`);
    await q.query(`CREATE UNIQUE INDEX job_org_number_key ON job (organisation_id, lower(number))`);

    await q.query(`
      CREATE TABLE spool (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organisation_id uuid NOT NULL,
        job_id uuid NOT NULL,
        mark text NOT NULL CHECK (length(mark) BETWEEN 1 AND 60),
        line_number text NOT NULL CHECK (length(line_number) BETWEEN 1 AND 80),
        status text NOT NULL DEFAULT 'drafting' CHECK (status IN
          ('drafting', 'issued', 'cut', 'fitted', 'welded', 'inspected', 'released', 'shipped', 'on-hold')),
        current_revision_id uuid,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1 CHECK (version >= 1),
        UNIQUE (id, organisation_id),
        FOREIGN KEY (job_id, organisation_id) REFERENCES job (id, organisation_id)
      )`);
    await q.query(`CREATE UNIQUE INDEX spool_job_mark_key ON spool (job_id, lower(mark))`);
    await q.query(`CREATE INDEX spool_org_idx ON spool (organisation_id)`);

    await q.query(`
      CREATE TABLE spool_revision (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organisation_id uuid NOT NULL,
        spool_id uuid NOT NULL,
        letter text NOT NULL CHECK (letter ~ '^[A-Z]{1,3}$'),
        state text NOT NULL CHECK (state IN ('draft', 'issued', 'superseded')),
        design jsonb NOT NULL CHECK (jsonb_typeof(design) = 'object'),
        note text NOT NULL DEFAULT '',
        author_id uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        issued_at timestamptz,
        version integer NOT NULL DEFAULT 1 CHECK (version >= 1),
        UNIQUE (id, organisation_id),
        UNIQUE (spool_id, letter),
        FOREIGN KEY (spool_id, organisation_id) REFERENCES spool (id, organisation_id),
        FOREIGN KEY (author_id, organisation_id) REFERENCES app_user (id, organisation_id),
        CHECK ((state = 'draft') = (issued_at IS NULL))
      )`);
    // One working draft and at most one current issued revision per spool.
    await q.query(
      `CREATE UNIQUE INDEX spool_revision_one_draft ON spool_revision (spool_id) WHERE state = 'draft'`,
    );
    await q.query(
      `CREATE UNIQUE INDEX spool_revision_one_issued ON spool_revision (spool_id) WHERE state = 'issued'`,
    );
    await q.query(`
      ALTER TABLE spool ADD CONSTRAINT spool_current_revision_fk
        FOREIGN KEY (current_revision_id, organisation_id) REFERENCES spool_revision (id, organisation_id)`);

    // An issued revision never changes again: the only allowed update is issued -> superseded.
    await q.query(`
      CREATE FUNCTION spool_revision_guard() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'DELETE' THEN
          IF OLD.state <> 'draft' THEN
            RAISE EXCEPTION 'issued revision % cannot be deleted', OLD.id USING ERRCODE = 'check_violation';
          END IF;
          RETURN OLD;
        END IF;
        IF OLD.state = 'draft' THEN
          RETURN NEW;
        END IF;
        IF OLD.state = 'issued' AND NEW.state = 'superseded'
           AND NEW.design = OLD.design AND NEW.note = OLD.note AND NEW.letter = OLD.letter
           AND NEW.spool_id = OLD.spool_id AND NEW.author_id = OLD.author_id
           AND NEW.issued_at = OLD.issued_at AND NEW.organisation_id = OLD.organisation_id THEN
          RETURN NEW;
        END IF;
        RAISE EXCEPTION 'issued revision % cannot be changed', OLD.id USING ERRCODE = 'check_violation';
      END $$`);
    await q.query(`
      CREATE TRIGGER spool_revision_guard BEFORE UPDATE OR DELETE ON spool_revision
        FOR EACH ROW EXECUTE FUNCTION spool_revision_guard()`);

    await q.query(`
      CREATE TABLE audit_event (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organisation_id uuid NOT NULL REFERENCES organisation (id),
        actor_id uuid REFERENCES app_user (id),
        action text NOT NULL CHECK (length(action) BETWEEN 1 AND 80),
        entity_type text NOT NULL CHECK (length(entity_type) BETWEEN 1 AND 40),
        entity_id uuid,
        at timestamptz NOT NULL DEFAULT now(),
        details jsonb NOT NULL DEFAULT '{}'::jsonb
      )`);
    await q.query(`CREATE INDEX audit_event_org_at_idx ON audit_event (organisation_id, at DESC)`);
    await q.query(`CREATE INDEX audit_event_entity_idx ON audit_event (entity_type, entity_id)`);

    // connect-pg-simple's table (its table.sql), created here so the store never runs DDL.
    await q.query(`
      CREATE TABLE session (
        sid varchar NOT NULL COLLATE "default" PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX "IDX_session_expire" ON session (expire)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE session`);
    await q.query(`DROP TABLE audit_event`);
    await q.query(`ALTER TABLE spool DROP CONSTRAINT spool_current_revision_fk`);
    await q.query(`DROP TABLE spool_revision`);
    await q.query(`DROP FUNCTION spool_revision_guard`);
    await q.query(`DROP TABLE spool`);
    await q.query(`DROP TABLE job`);
    await q.query(`DROP TABLE app_user`);
    await q.query(`DROP TABLE organisation`);
  }
}
