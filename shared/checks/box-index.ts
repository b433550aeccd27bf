import Flatbush from 'flatbush';

/** Boxes searchable by area. */
export interface BoxIndex {
  /**
   * Calls `visit` with the position of every box that intersects or touches the query box, in no
   * particular order. `visit` must not search the same index again.
   */
  search(minX: number, minY: number, maxX: number, maxY: number, visit: (i: number) => void): void;
}

/**
 * Below this many boxes, looking at each is cheaper than building an index. Measured on the bench job,
 * whose sides hold about 80 face bores: as fast as flatbush once warm, and far cheaper in one run of
 * `borewright check`, where the index's code is still cold for most of the panels it is built for.
 */
const INDEX_FROM = 128;
/**
 * Flatbush's node size. The checks search once per bore, so queries matter more than building: small
 * nodes measured about a third faster than the default 16.
 */
const NODE_SIZE = 4;

/**
 * Indexes boxes given as [minX, minY, maxX, maxY] one after the other. A flatbush index once there are
 * enough boxes to repay building one, so that a panel of thousands of bores is never compared pair by pair;
 * a plain scan for the few boxes of an ordinary panel.
 */
export function indexBoxes(boxes: Float64Array): BoxIndex {
  const count = boxes.length / 4;
  if (count < INDEX_FROM) {
    return {
      search(minX, minY, maxX, maxY, visit) {
        for (let i = 0; i < count; i++) {
          const k = 4 * i;
          if (boxes[k] <= maxX && boxes[k + 1] <= maxY && boxes[k + 2] >= minX && boxes[k + 3] >= minY) visit(i);
        }
      },
    };
  }
  const index = new Flatbush(count, NODE_SIZE);
  for (let k = 0; k < boxes.length; k += 4) index.add(boxes[k], boxes[k + 1], boxes[k + 2], boxes[k + 3]);
  index.finish();
  return {
    search(minX, minY, maxX, maxY, visit) {
      // The visitor returns nothing, which flatbush reads as "do not collect": no result list is built.
      index.search(minX, minY, maxX, maxY, visit as (i: number) => boolean);
    },
  };
}
