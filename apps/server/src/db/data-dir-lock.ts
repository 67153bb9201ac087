/** An exclusive lock on a data folder: one Hexloom server per embedded database. */
import { closeSync, openSync, readFileSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';

/** A second server asked for a data folder that a live server holds. */
export class DataDirLockedError extends Error {
  override readonly name = 'DataDirLockedError';
}

/** Whether a process with this id is alive (signal 0 checks without sending anything). */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Takes `<dir>/hexloom.lock` (created exclusively, holding this process id) and returns its release. A lock left by
 * a process that no longer runs (killed) is taken over; one held by a live process, this one included, refuses.
 * @throws DataDirLockedError naming the folder and the holder's process id.
 */
export function lockDataDir(dir: string): () => void {
  const file = join(dir, 'hexloom.lock');
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(file, 'wx', 0o600);
      writeSync(fd, `${process.pid}\n`);
      closeSync(fd);
      return () => rmSync(file, { force: true });
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = Number(readFileSync(file, 'utf8').trim());
      if (Number.isInteger(holder) && holder > 0 && alive(holder)) {
        throw new DataDirLockedError(`the data folder ${dir} is in use by another Hexloom server (process ${holder}); stop it first, or give this one its own HEXLOOM_DATA_DIR`);
      }
      rmSync(file, { force: true });
    }
  }
  throw new DataDirLockedError(`could not lock the data folder ${dir}`);
}
