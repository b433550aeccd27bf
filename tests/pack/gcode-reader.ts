// Reads a drilling program back as a machine would run it. The text is split into words and comments by
// gcode-parser (2.2.0, from npm, a general-purpose G-code reader); the words are then run by the meaning
// ISO 6983 / RS-274 gives them (published, from memory): G21 millimetres, G90 absolute, G17 the XY plane,
// G94 feed per minute, G0 rapid and G1 feed moves, G81 and G83 canned drilling cycles (to X Y at the
// current height, down to R, feed to Z, back to the initial height with G98 or to R with G99; G83 the same
// in pecks of Q), G80 cancelling the cycle, T… M6 a tool change, S… M3 spindle on, M5 off, M30 the end.
// Anything else is refused, so a program cannot do something this reader does not see.
import { parseStringSync } from 'gcode-parser';

/** One hole the program drills: where, the bottom of the hole, the tool in the spindle, and the cycle. */
export interface Drilled {
  x: number;
  y: number;
  bottom: number;
  r: number;
  tool: number;
  cycle: 81 | 83;
  peck?: number;
  feed: number;
  speed: number;
}

/** A move that cuts: the tool below `surface` anywhere but inside a drilling cycle. */
export interface Cut {
  line: string;
  z: number;
}

export interface ReadBack {
  drilled: Drilled[];
  cuts: Cut[];
  comments: string[];
  /** Rapid moves across the panel (X or Y changing) and the height they were made at. */
  traverseHeights: number[];
  ended: boolean;
}

/** Runs a program's words; `surface` is the Z of the side up, below which any move but a drill is a cut. */
export function readProgram(text: string, surface: number): ReadBack {
  const lines = parseStringSync(text) as { line: string; words: [string, number][]; comments?: string[] }[];
  const out: ReadBack = { drilled: [], cuts: [], comments: [], traverseHeights: [], ended: false };
  const at = { x: Number.NaN, y: Number.NaN, z: Number.NaN };
  let metric = false;
  let absolute = false;
  let motion: number | undefined;
  let cycleReturn: 98 | 99 = 98;
  let pendingTool: number | undefined;
  let tool: number | undefined;
  let speed = 0;
  let spindle = false;
  let feed = 0;
  let r = Number.NaN;
  let q: number | undefined;
  for (const { line, words, comments } of lines) {
    out.comments.push(...(comments ?? []));
    if (out.ended && words.length > 0) throw new Error(`words after M30: ${line}`);
    const axes: { X?: number; Y?: number; Z?: number } = {};
    let lineMotion: number | undefined;
    let toolChange = false;
    for (const [letter, value] of words) {
      switch (letter) {
        case 'G':
          if (value === 21) metric = true;
          else if (value === 90) absolute = true;
          else if (value === 17 || value === 94) continue;
          else if (value === 98 || value === 99) cycleReturn = value;
          else if (value === 80) motion = undefined;
          else if (value === 0 || value === 1 || value === 81 || value === 83) lineMotion = value;
          else throw new Error(`G${value} is not read: ${line}`);
          break;
        case 'M':
          if (value === 6) toolChange = true;
          else if (value === 3) spindle = true;
          else if (value === 5) spindle = false;
          else if (value === 30) out.ended = true;
          else throw new Error(`M${value} is not read: ${line}`);
          break;
        case 'T':
          pendingTool = value;
          break;
        case 'S':
          speed = value;
          break;
        case 'F':
          feed = value;
          break;
        case 'R':
          r = value;
          break;
        case 'Q':
          q = value;
          break;
        case 'X':
        case 'Y':
        case 'Z':
          axes[letter] = value;
          break;
        default:
          throw new Error(`${letter} is not read: ${line}`);
      }
    }
    if (toolChange) {
      if (spindle) throw new Error(`tool change with the spindle running: ${line}`);
      tool = pendingTool;
    }
    if (lineMotion !== undefined) motion = lineMotion;
    const moves = axes.X !== undefined || axes.Y !== undefined || axes.Z !== undefined;
    if (!moves) continue;
    if (!metric || !absolute) throw new Error(`a move before G21 G90: ${line}`);
    if (motion === undefined) throw new Error(`a move with no motion mode: ${line}`);
    if (motion === 0 || motion === 1) {
      const to = { x: axes.X ?? at.x, y: axes.Y ?? at.y, z: axes.Z ?? at.z };
      if ((to.x !== at.x || to.y !== at.y) && !(Number.isNaN(to.x) && Number.isNaN(at.x))) out.traverseHeights.push(Math.min(at.z, to.z));
      if (to.z < surface || (motion === 1 && at.z <= surface)) out.cuts.push({ line, z: to.z });
      Object.assign(at, to);
      continue;
    }
    // A canned cycle: to X Y at the initial height, rapid to R, feed to Z (in pecks for G83), back up.
    if (axes.Z === undefined || Number.isNaN(r)) throw new Error(`a drilling cycle without Z or R: ${line}`);
    if (tool === undefined || !spindle) throw new Error(`a drilling cycle with no tool or the spindle stopped: ${line}`);
    if (motion === 83 && !(q !== undefined && q > 0)) throw new Error(`G83 without a peck step: ${line}`);
    const initial = at.z;
    if (!(initial >= r) || !(r > surface)) throw new Error(`a cycle whose R plane is not above the panel and below the initial height: ${line}`);
    const to = { x: axes.X ?? at.x, y: axes.Y ?? at.y };
    out.traverseHeights.push(initial);
    out.drilled.push({ ...to, bottom: axes.Z, r, tool, cycle: motion as 81 | 83, ...(motion === 83 ? { peck: q } : {}), feed, speed });
    Object.assign(at, { ...to, z: cycleReturn === 98 ? initial : r });
  }
  return out;
}
