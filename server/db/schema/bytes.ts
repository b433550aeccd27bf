import { customType } from 'drizzle-orm/pg-core';

/** Raw bytes: PGlite hands back a Uint8Array, node-postgres a Buffer; both come out as a Buffer. */
export const bytes = customType<{ data: Buffer; driverData: Uint8Array }>({
  dataType: () => 'bytea',
  fromDriver: (value) => Buffer.from(value.buffer, value.byteOffset, value.byteLength),
});
