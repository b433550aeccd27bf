import type { PackProgress } from './pack-order';

/** Packs being made on this server, by the ticket their download named: how far each has got. */
export class PackProgressBoard {
  private readonly packs = new Map<string, PackProgress>();

  /** Follows a pack from its start, with no panel reached yet, until `finish`. */
  start(ticket: string, panels: number): (progress: PackProgress) => void {
    this.packs.set(ticket, { panel: 0, panels });
    return (progress) => {
      if (this.packs.has(ticket)) this.packs.set(ticket, progress);
    };
  }

  finish(ticket: string): void {
    this.packs.delete(ticket);
  }

  /** How far the pack of `ticket` has got; undefined when no such pack is being made here. */
  get(ticket: string): PackProgress | undefined {
    return this.packs.get(ticket);
  }
}
