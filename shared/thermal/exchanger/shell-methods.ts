/**
 * The shell-side stage as the rating sees it: one geometry preparation per shell
 * (`prepareBellDelaware`, which also holds Kern's area and diameter) and the method table
 * (`SHELL_METHODS` in ./bell-delaware.ts) that both the default and a forced choice go through.
 * A rating uses the requested method (Bell–Delaware by default) and always computes Kern's beside
 * it as the second opinion; a new method is a new entry in that table, never an `if` in the rating.
 */
import type { ShellMethod } from '../../schemas/thermal';
import { SHELL_METHODS, type ShellMethodEntry } from './bell-delaware';

export { prepareBellDelaware as prepareShell, type BaffledShell, type PreparedShell, type ShellMethodEntry, type ShellSideResult } from './bell-delaware';

export const DEFAULT_SHELL_METHOD: ShellMethod = 'bell-delaware';

/** The table's entry for a method id (default Bell–Delaware). */
export function shellMethod(id: ShellMethod | undefined): ShellMethodEntry {
  return SHELL_METHODS[id ?? DEFAULT_SHELL_METHOD];
}

export const kernMethod: ShellMethodEntry = SHELL_METHODS.kern;
