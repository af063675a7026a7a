-- photos.findings_version is the cache key and ETag of a photo's findings list (GET /api/photos/:id/findings).
-- Every write that changes that list bumps it here, in the same transaction, whichever code path makes it.
CREATE FUNCTION bump_findings_version_from_findings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  -- Each branch names only the transition tables its event has.
  IF TG_OP = 'INSERT' THEN
    UPDATE photos SET findings_version = findings_version + 1 WHERE id IN (SELECT photo_id FROM new_rows);
  ELSIF TG_OP = 'DELETE' THEN
    UPDATE photos SET findings_version = findings_version + 1 WHERE id IN (SELECT photo_id FROM old_rows);
  ELSE
    UPDATE photos SET findings_version = findings_version + 1
      WHERE id IN (SELECT photo_id FROM new_rows UNION SELECT photo_id FROM old_rows);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER findings_bump_version_insert AFTER INSERT ON findings REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_findings();
--> statement-breakpoint
CREATE TRIGGER findings_bump_version_update AFTER UPDATE ON findings REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_findings();
--> statement-breakpoint
CREATE TRIGGER findings_bump_version_delete AFTER DELETE ON findings REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_findings();
--> statement-breakpoint
CREATE FUNCTION bump_findings_version_from_comments() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'INSERT' OR TG_OP = 'UPDATE' THEN
    UPDATE photos SET findings_version = findings_version + 1
      WHERE id IN (SELECT f.photo_id FROM findings f WHERE f.id IN (SELECT finding_id FROM new_rows));
  ELSE
    UPDATE photos SET findings_version = findings_version + 1
      WHERE id IN (SELECT f.photo_id FROM findings f WHERE f.id IN (SELECT finding_id FROM old_rows));
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER comments_bump_version_insert AFTER INSERT ON comments REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_comments();
--> statement-breakpoint
CREATE TRIGGER comments_bump_version_update AFTER UPDATE ON comments REFERENCING NEW TABLE AS new_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_comments();
--> statement-breakpoint
CREATE TRIGGER comments_bump_version_delete AFTER DELETE ON comments REFERENCING OLD TABLE AS old_rows
  FOR EACH STATEMENT EXECUTE FUNCTION bump_findings_version_from_comments();
--> statement-breakpoint
CREATE FUNCTION bump_findings_version_on_photo_sharing() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.owner_visible IS DISTINCT FROM OLD.owner_visible THEN
    NEW.findings_version := OLD.findings_version + 1;
  END IF;
  RETURN NEW;
END $$;
--> statement-breakpoint
CREATE TRIGGER photos_bump_version_on_sharing BEFORE UPDATE OF owner_visible ON photos
  FOR EACH ROW EXECUTE FUNCTION bump_findings_version_on_photo_sharing();
--> statement-breakpoint
CREATE FUNCTION bump_findings_version_on_author_rename() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF NEW.name IS DISTINCT FROM OLD.name THEN
    UPDATE photos SET findings_version = findings_version + 1
      WHERE id IN (SELECT photo_id FROM findings WHERE author_id = NEW.id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER users_bump_version_on_rename AFTER UPDATE OF name ON users
  FOR EACH ROW EXECUTE FUNCTION bump_findings_version_on_author_rename();
