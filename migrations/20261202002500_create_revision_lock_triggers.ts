import type { Knex } from 'knex';

/**
 * The database itself keeps a revision's record beyond doubt: once it leaves draft its content,
 * prediction and hash cannot change, only the listed state transitions are possible, and a
 * revision that left draft cannot be deleted. Attachments can be added or removed only on drafts.
 */
const TRANSITIONS = [
  ['draft', 'submitted'], ['draft', 'withdrawn'],
  ['submitted', 'approved'], ['submitted', 'returned'], ['submitted', 'withdrawn'],
  ['approved', 'superseded'], ['approved', 'withdrawn']
];

export async function up(knex: Knex): Promise<void> {
  const allowed = TRANSITIONS.map(([a, b]) => `('${a}','${b}')`).join(', ');
  await knex.raw(`CREATE TRIGGER formulation_revisions_lock BEFORE UPDATE ON formulation_revisions FOR EACH ROW
    BEGIN
      IF OLD.state <> 'draft' AND (NOT (NEW.content_json <=> OLD.content_json) OR NOT (NEW.predicted_json <=> OLD.predicted_json)
          OR NOT (NEW.content_sha256 <=> OLD.content_sha256) OR NOT (NEW.core_version <=> OLD.core_version)) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'revision content is locked once it leaves draft';
      END IF;
      IF NEW.formulation_id <> OLD.formulation_id OR NEW.revision_no <> OLD.revision_no OR NEW.created_by <> OLD.created_by THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'revision identity cannot change';
      END IF;
      IF NEW.state <> OLD.state AND (OLD.state, NEW.state) NOT IN (${allowed}) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'revision state transition not allowed';
      END IF;
    END`);
  await knex.raw(`CREATE TRIGGER formulation_revisions_no_delete BEFORE DELETE ON formulation_revisions FOR EACH ROW
    BEGIN
      IF OLD.state <> 'draft' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a revision that left draft cannot be deleted';
      END IF;
    END`);
  for (const [event, row] of [['INSERT', 'NEW'], ['DELETE', 'OLD']] as const) {
    await knex.raw(`CREATE TRIGGER revision_attachments_draft_only_${event.toLowerCase()} BEFORE ${event} ON revision_attachments FOR EACH ROW
      BEGIN
        IF (SELECT state FROM formulation_revisions WHERE id = ${row}.revision_id) <> 'draft' THEN
          SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'attachments are locked once the revision leaves draft';
        END IF;
      END`);
  }
  await knex.raw(`CREATE TRIGGER revision_attachments_no_update BEFORE UPDATE ON revision_attachments FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'attachments cannot be changed; remove and add again on a draft'`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS revision_attachments_no_update');
  await knex.raw('DROP TRIGGER IF EXISTS revision_attachments_draft_only_delete');
  await knex.raw('DROP TRIGGER IF EXISTS revision_attachments_draft_only_insert');
  await knex.raw('DROP TRIGGER IF EXISTS formulation_revisions_no_delete');
  await knex.raw('DROP TRIGGER IF EXISTS formulation_revisions_lock');
}
