import type { z } from 'zod';

/** Formats a zod path the way a user reads it in a file: `panels[3].bores[1].diameter`. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => {
    if (typeof key === 'number') return `${out}[${key}]`;
    const name = String(key);
    return out === '' ? name : `${out}.${name}`;
  }, '');
}

/** One line per problem, each led by the path of the value it concerns: `fittings[3].bores[1].diameter: must be greater than 0`. */
export function formatIssues(error: z.ZodError): string[] {
  return error.issues.map((issue) => {
    const where = formatPath(issue.path);
    return where === '' ? issue.message : `${where}: ${issue.message}`;
  });
}
