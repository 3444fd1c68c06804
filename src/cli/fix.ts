/**
 * Applying fixes to a file on disk: edits are applied from the end of the text backwards (so
 * earlier offsets stay valid), and the new text is written to a temporary file in the same folder
 * and renamed over the original, so an interrupted run leaves either the old or the new file,
 * never a truncated or mixed one.
 */
import { closeSync, fsyncSync, openSync, renameSync, statSync, unlinkSync, writeSync, chmodSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import type { TextEdit } from '../checks/types';

/** Applies non-overlapping edits to a text; overlapping or out-of-range edits are skipped. */
export function applyEdits(text: string, edits: readonly TextEdit[]): { text: string; applied: TextEdit[] } {
  const sorted = [...edits].sort((a, b) => b.offset - a.offset);
  const applied: TextEdit[] = [];
  let result = text;
  let limit = text.length;
  for (const edit of sorted) {
    if (edit.offset < 0 || edit.length < 0 || edit.offset + edit.length > limit) continue;
    result = result.slice(0, edit.offset) + edit.text + result.slice(edit.offset + edit.length);
    limit = edit.offset;
    applied.push(edit);
  }
  return { text: result, applied: applied.reverse() };
}

/** Replaces a file's content atomically (temporary file in the same folder, fsync, rename). */
export function writeFileAtomic(path: string, content: string): void {
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now()}.notary-tmp`);
  let mode: number | undefined;
  try {
    mode = statSync(path).mode & 0o777;
  } catch {
    mode = undefined;
  }
  const fd = openSync(temp, 'wx', mode ?? 0o644);
  try {
    writeSync(fd, content, null, 'utf8');
    fsyncSync(fd);
  } catch (error) {
    closeSync(fd);
    unlinkSync(temp);
    throw error;
  }
  closeSync(fd);
  if (mode !== undefined) chmodSync(temp, mode);
  renameSync(temp, path);
}
