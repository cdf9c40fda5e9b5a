/**
 * How the history a person reads is built from the saves the database keeps.
 *
 * Every save stays a stored, immutable version (restore and audit need each
 * one); but an autosave every few seconds would list dozens of versions for
 * one sitting. So the history groups saves into editing sessions: a save
 * joins the session before it when
 *  - the same person saved it,
 *  - it came at most `EDITING_SESSION_GAP_MS` after the session's last save,
 *  - and nothing marked the end of that session: the last save was not named
 *    ("Checkpoint: before review"), no workflow step (submit, approve,
 *    request changes, freeze, reopen) happened at that version, and neither
 *    save is a restore of an older version (a restore stands alone, so the
 *    history says where its text came from).
 * A session is shown as its last version, with its first version, the number
 * of saves and the time from first to last save.
 */

/** The longest pause between two saves of one editing session: 10 minutes (our choice: a coffee, not a meeting). */
export const EDITING_SESSION_GAP_MS = 10 * 60 * 1000;

export interface StoredSave {
  versionNumber: number;
  authorId: number;
  createdAt: Date;
  /** The version this save restored, when it was a restore. */
  restoredFrom: number | null;
}

export interface EditingSession {
  /** The last version of the session: what it left behind. */
  versionNumber: number;
  firstVersionNumber: number;
  saveCount: number;
  authorId: number;
  startedAt: Date;
  /** When the last version was saved. */
  createdAt: Date;
  /** The name of the last version, if it has one. */
  label: string | null;
  restoredFrom: number | null;
}

export interface SessionBreaks {
  /** The current name of each named version. */
  labels: ReadonlyMap<number, string>;
  /** Versions at which a workflow step happened: the session ends there. */
  transitionsAt: ReadonlySet<number>;
}

/** Groups saves (any order) into editing sessions, newest first. */
export function coalesceMemoVersions(saves: readonly StoredSave[], breaks: SessionBreaks): EditingSession[] {
  const ordered = [...saves].sort((a, b) => a.versionNumber - b.versionNumber);
  const sessions: EditingSession[] = [];
  for (const save of ordered) {
    const open = sessions.at(-1);
    const joins =
      open !== undefined &&
      open.authorId === save.authorId &&
      save.createdAt.getTime() - open.createdAt.getTime() <= EDITING_SESSION_GAP_MS &&
      !breaks.labels.has(open.versionNumber) &&
      !breaks.transitionsAt.has(open.versionNumber) &&
      open.restoredFrom === null &&
      save.restoredFrom === null;
    const label = breaks.labels.get(save.versionNumber) ?? null;
    if (joins) {
      open.versionNumber = save.versionNumber;
      open.saveCount += 1;
      open.createdAt = save.createdAt;
      open.label = label;
    } else {
      sessions.push({
        versionNumber: save.versionNumber,
        firstVersionNumber: save.versionNumber,
        saveCount: 1,
        authorId: save.authorId,
        startedAt: save.createdAt,
        createdAt: save.createdAt,
        label,
        restoredFrom: save.restoredFrom,
      });
    }
  }
  return sessions.reverse();
}
