/**
 * A shop's own fitting as a catalog import would carry it: a cup hinge on the 52/5.5 pattern, which the
 * built-in catalog does not have. Plain JSON (not parsed), the way it arrives in a request or a file.
 */
export function shopHinge(id = 'shop-hinge-52'): Record<string, unknown> {
  const cup = 'trade-reference §2: cup bore Ø35 mm (published, Popular Woodworking no. 155, June 2006); cup depth 13 mm (common practice)';
  const fixing = 'trade-reference §2: the 52/5.5 pattern, two Ø8 holes 52 mm apart, 5.5 mm further from the door edge than the cup centre (common practice)';
  return {
    id,
    name: 'Cup hinge, full overlay, 52/5.5',
    purpose: 'hinge-cup',
    onSystemRow: false,
    bores: [
      { id: 'cup', kind: 'face', x: 0, y: 0, diameter: 35, depth: 13, source: cup },
      { id: 'fix-1', kind: 'face', x: 5.5, y: -26, diameter: 8, depth: 11, source: fixing },
      { id: 'fix-2', kind: 'face', x: 5.5, y: 26, diameter: 8, depth: 11, source: fixing },
    ],
    keepOuts: [{ x: -17.5, y: -30, width: 35, height: 60, source: 'the envelope of the cup and its fixing holes, as above' }],
    hinge: {
      cupBore: 'cup',
      overlay: 'full',
      constant: 13,
      boringDistance: { min: 3, max: 7 },
      openingAngle: 110,
      source: 'trade-reference §2: cup-boring distance B from 3 to 7 mm (common practice); the constant and the opening angle are the shop\'s, from its hinge maker',
    },
  };
}
