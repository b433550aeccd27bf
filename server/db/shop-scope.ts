import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * Whose rows a piece of work may see. Every query the app makes runs in one of these, carried by
 * AsyncLocalStorage from where the work started (the request, once its session is read) down to the
 * driver (client.ts), which puts the connection a query or transaction runs on in the scope first:
 *
 * - a shop: the app's role `borewright_app` (row-level security applies to it) and the connection's
 *   `borewright.shop_id`; every policy compares `shop_id` with that setting, and every shop-owned
 *   column defaults to it, so no repository names the shop and none can be handed one from a request;
 * - `null`, a request nobody is signed in to: the app's role without a shop, which sees no shop's rows;
 * - across shops: the connecting role itself (the tables' owner, which bypasses row-level security),
 *   only for the few look-ups that must find a row before anyone's shop is known (`acrossShops`);
 * - any scope: whatever the connection is in, for a call of a database function that runs as its owner
 *   whoever calls it (`inAnyScope`), so that it costs PGlite's one connection no change of scope;
 * - no scope at all (migrations, the demo seed's shop row, the command line, backups, tests that read
 *   the database directly): as across shops.
 */
type Scope = { shopId: number | null } | { acrossShops: true } | { anyScope: true };

const current = new AsyncLocalStorage<Scope>();

/** The role the app's shop queries run as: not a superuser and not the tables' owner. */
export const APP_ROLE = 'borewright_app';

function checkedScope(shopId: number | null): Scope {
  if (shopId !== null && !Number.isSafeInteger(shopId)) throw new Error(`not a shop id: ${shopId}`);
  return { shopId };
}

/**
 * Runs `work` as the given shop (null: as no shop), whatever scope it was called in. The result is
 * awaited inside the scope: drizzle's queries are lazy and run only when awaited.
 */
export function inShop<T>(shopId: number | null, work: () => T | PromiseLike<T>): Promise<T> {
  return current.run(checkedScope(shopId), async () => await work());
}

/** Runs the rest of a request (express's `next`) as the given shop: everything it starts inherits the scope. */
export function continueInShop(shopId: number | null, next: () => void): void {
  current.run(checkedScope(shopId), next);
}

/**
 * Runs `work` with the owner's view of every shop. Kept to the look-ups that find a shop: an account by
 * address (sign-in) or id (the session), a mail token by its hash, and the session and throttle tables,
 * which belong to no shop (server/db/README.md lists them).
 */
export function acrossShops<T>(work: () => T | PromiseLike<T>): Promise<T> {
  return current.run({ acrossShops: true }, async () => await work());
}

/**
 * Runs `work` in whatever scope the connection it gets is in: only for calls of database functions that
 * run as their owner (SECURITY DEFINER), whose answer so does not depend on the caller's role or shop. On a
 * PostgreSQL pool it runs as the connecting role, as outside any scope.
 */
export function inAnyScope<T>(work: () => T | PromiseLike<T>): Promise<T> {
  return current.run({ anyScope: true }, async () => await work());
}

/** The shop the current work runs as: a shop's id, null for no shop, undefined when across shops, in any scope or unscoped. */
export function currentShop(): number | null | undefined {
  const scope = current.getStore();
  return scope && 'shopId' in scope ? scope.shopId : undefined;
}

/** The shop the current work runs as; a signed-in request always has one, so anything else is a mistake here. */
export function requireShop(): number {
  const shopId = currentShop();
  if (typeof shopId !== 'number') throw new Error('this work runs outside any shop');
  return shopId;
}

/**
 * The statements that put a connection in the current scope for the rest of its session, or undefined
 * when it runs as the connecting role. A pooled PostgreSQL connection checked out for one piece of work
 * is given them, and `SCOPE_RESET` ends them before it goes back.
 */
export function scopeStatements(): string | undefined {
  const shopId = currentShop();
  if (shopId === undefined) return undefined;
  const role = `set role ${APP_ROLE}`;
  return shopId === null ? role : `${role}; select set_config('borewright.shop_id', '${shopId}', false)`;
}

/**
 * The statements that take a transaction opened across shops into one shop's scope for the rest of it:
 * for the one piece of work that makes a shop and then its first rows (server/shops/shops.service.ts).
 */
export function enterShopStatements(shopId: number): string[] {
  if (!Number.isSafeInteger(shopId)) throw new Error(`not a shop id: ${shopId}`);
  return [`set local role ${APP_ROLE}`, `select set_config('borewright.shop_id', '${shopId}', true)`];
}

/** Puts a pooled connection back as the connecting role with no shop. */
export const SCOPE_RESET = 'reset role; reset borewright.shop_id';

/**
 * The statements that move a connection kept from one piece of work to the next (PGlite's one connection)
 * from whatever scope it is in to the current one, for the rest of its session; undefined when the current
 * work runs in any scope, which leaves the connection as it is.
 */
export function scopeSwitch(): string | undefined {
  const scope = current.getStore();
  if (scope && 'anyScope' in scope) return undefined;
  const statements = scopeStatements();
  return statements ? `${SCOPE_RESET}; ${statements}` : SCOPE_RESET;
}
