import "server-only";
// The database for the Next.js server. Only lib/server imports it (ESLint keeps app/ and
// components/ away from db/); scripts and tests import db/connection.ts, which this re-exports.
export { closeDb, db, pool, schema, type Database, type Queryable } from "./connection";
