import type { Request, RequestHandler } from 'express';
import { continueInShop } from '../db/shop-scope';

/** The shop of each request's signed-in member, as its session's account says (passport.ts). */
const shopOfRequest = new WeakMap<Request, number>();

/** Records the shop of the account the request's session signs in; called only by the session's look-up. */
export function setRequestShop(req: Request, shopId: number): void {
  shopOfRequest.set(req, shopId);
}

/**
 * Runs the rest of the request in its member's shop (no shop when nobody is signed in). The shop comes
 * only from the session's account, never from a body, a header or the address.
 */
export const requestShopScope: RequestHandler = (req, _res, next) => {
  continueInShop(shopOfRequest.get(req) ?? null, next);
};
