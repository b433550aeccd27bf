/** Where a command writes: standard output for results, standard error for problems. */
export interface CliIo {
  out(text: string): void;
  err(text: string): void;
}

/** The process's own streams. */
export const processIo: CliIo = {
  out: (text) => process.stdout.write(`${text}\n`),
  err: (text) => process.stderr.write(`${text}\n`),
};

/** Exit codes: 0 all clear (warnings allowed), 1 a check found an error, 2 the command could not run. */
export const EXIT = { ok: 0, findings: 1, unusable: 2 } as const;
