import type { QueryInterface } from 'sequelize';

// When a photo row goes (deleted directly or by a cascade from its casting,
// heat or workshop), a trigger queues its object keys in the same
// transaction; a worker then deletes the objects. No deletion path can leave
// objects that nothing references.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(`
    CREATE TABLE object_deletions (
      object_key varchar(300) PRIMARY KEY,
      queued_at timestamptz NOT NULL DEFAULT now(),
      attempts integer NOT NULL DEFAULT 0,
      last_error text
    )`);
  await qi.sequelize.query(`
    CREATE FUNCTION queue_photo_objects() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO object_deletions (object_key)
      VALUES (OLD.original_key), (OLD.display_key), (OLD.thumb_key)
      ON CONFLICT (object_key) DO NOTHING;
      RETURN OLD;
    END $$`);
  await qi.sequelize.query(`
    CREATE TRIGGER photos_queue_objects AFTER DELETE ON photos
    FOR EACH ROW EXECUTE FUNCTION queue_photo_objects()`);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS photos_queue_objects ON photos');
  await qi.sequelize.query('DROP FUNCTION IF EXISTS queue_photo_objects()');
  await qi.dropTable('object_deletions');
}
