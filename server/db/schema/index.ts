/** Every table of the database; drizzle-kit reads this file, the client gets it as its schema. */
export { shops } from './shops';
export { users } from './users';
export { sessions } from './sessions';
export { jobs } from './jobs';
export { carcasses } from './carcasses';
export { panels } from './panels';
export { placements } from './placements';
export { bores } from './bores';
export { activity } from './activity';
export { outbox } from './outbox';
export { mailTokens } from './mail-tokens';
export { shopFittings } from './shop-fittings';
export { attachments } from './attachments';
export { signInAttempts, signInAddresses } from './sign-in-attempts';
export { shopSettings } from './shop-settings';
export { jobEvents, jobPresence, packProgress } from './live';
export { requestCounters } from './request-counters';
export { signUps } from './sign-ups';
