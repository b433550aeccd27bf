import type { z } from 'zod';

type Issue = z.core.$ZodIssue;

/** Formats a zod path the way a user reads it in a file: `panels[3].bores[1].diameter`. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => {
    if (typeof key === 'number') return `${out}[${key}]`;
    const name = String(key);
    return out === '' ? name : `${out}.${name}`;
  }, '');
}

/**
 * A union of objects (a face bore or an edge bore) that matches no branch reports "Invalid input"
 * with the problems of every branch. The branch with the fewest problems is the one the author
 * meant, so its problems are the ones worth showing, each at its full path. On a tie, the last
 * branch's: a bore that fits neither kind better is read as an edge bore, the bore union listing
 * face bores first only for speed.
 */
function flatten(issue: Issue, prefix: readonly PropertyKey[]): { path: PropertyKey[]; message: string }[] {
  const path = [...prefix, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const closest = issue.errors.reduce((best, branch) => (branch.length <= best.length ? branch : best));
    // Only a union of objects has a branch to point into; a union of values (a number or a keyword) keeps its own message.
    if (closest.length > 0 && closest.every((inner) => inner.path.length > 0)) return closest.flatMap((inner) => flatten(inner, path));
  }
  // A record key its schema refuses: the key's own problem says why, at the key's path.
  if (issue.code === 'invalid_key' && issue.issues.length > 0) return issue.issues.map((inner) => ({ path, message: `the name ${inner.message}` }));
  return [{ path, message: issue.message }];
}

/** Every problem with its path as keys, for a form to put each beside its field. */
export function listIssues(error: z.ZodError): { path: PropertyKey[]; message: string }[] {
  return error.issues.flatMap((issue) => flatten(issue, []));
}

/** One line per problem, each led by the path of the value it concerns: `fittings[3].bores[1].diameter: must be greater than 0`. */
export function formatIssues(error: z.ZodError): string[] {
  return listIssues(error).map(({ path, message }) => {
    const where = formatPath(path);
    return where === '' ? message : `${where}: ${message}`;
  });
}
