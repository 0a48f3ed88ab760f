// The shape of CREDENTIAL_SIGNING_KEYS lives in lib/env.ts (next.config.ts loads that file, and its
// loader can't follow imports of other TypeScript files); this module names it for lib/certificates.
export { algorithmOf, parseSigningKeySet, type SigningKeyJwk } from "@/lib/env";
