// gcode-parser ships no types: the one call the read-back test makes.
declare module 'gcode-parser' {
  export function parseStringSync(text: string): { line: string; words: [string, number][]; comments?: string[] }[];
}
