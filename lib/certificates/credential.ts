// The Open Badges 3.0 OpenBadgeCredential of a certificate, and the JWT claims of its VC-JWT.
// Sources: 1EdTech Open Badges Specification 3.0 (https://www.imsglobal.org/spec/ob/v3p0/):
// §"OpenBadgeCredential" / AchievementCredential (required: @context, id, type, issuer,
// validFrom, credentialSubject), §"Profile", §"AchievementSubject", §"Achievement", §"Criteria",
// §"IdentityObject", and §8.2 "JSON Web Token Proof Format" (the payload is the credential with
// the claims iss = issuer.id, jti = id, nbf = validFrom, sub = credentialSubject.id). Built on the
// W3C Verifiable Credentials Data Model v2.0 (https://www.w3.org/TR/vc-data-model-2.0/) and the
// W3C Bitstring Status List v1.0 (https://www.w3.org/TR/vc-bitstring-status-list/) for status.
import { createHash } from "node:crypto";

/** In this order: the VC 2.0 context first (VCDM 2.0 §4.3), then Open Badges 3.0's (OB 3.0 §"OpenBadgeCredential", @context). */
export const CREDENTIAL_CONTEXTS = ["https://www.w3.org/ns/credentials/v2", "https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json"] as const;

/** Our one status list: revocation bits for every certificate (Bitstring Status List §2.1). */
export const STATUS_LIST_PATH = "/credentials/status/1";

export const CRITERIA_NARRATIVE =
  "Every lesson of the course completed, every module quiz passed, and the course's placement briefs approved by an instructor who reviewed the apprentice's own photographs.";

export type CredentialInput = {
  origin: string;
  certificateId: string;
  subjectId: string;
  issuedAt: Date;
  courseSlug: string;
  courseTitle: string;
  courseSummary: string;
  hours: number;
  email: string;
  salt: string;
  statusListIndex: number;
};

/** DateTimeZ with whole seconds, so validFrom and the JWT's nbf (a NumericDate in seconds) are equal. */
export function dateTimeZ(at: Date): string {
  return new Date(Math.floor(at.getTime() / 1000) * 1000).toISOString().replace(".000Z", "Z");
}

/** OB 3.0 IdentityObject hash: "sha256$" + hex SHA-256 of the identifier followed by the salt. */
export function identityHash(identifier: string, salt: string): string {
  return `sha256$${createHash("sha256").update(identifier + salt).digest("hex")}`;
}

export function issuerId(origin: string): string {
  return `${origin}/issuer`;
}

/** The issuer's Profile (OB 3.0 §"Profile": id and type required), also served at /issuer. */
export function issuerProfile(origin: string) {
  return {
    "@context": [...CREDENTIAL_CONTEXTS],
    id: issuerId(origin),
    type: ["Profile"],
    name: "Axisline",
    url: origin,
    description: "Training for live-sound technicians: courses, quizzes and instructor-reviewed placements.",
  };
}

export function buildOpenBadgeCredential(input: CredentialInput) {
  const { origin } = input;
  const profile = issuerProfile(origin);
  return {
    "@context": [...CREDENTIAL_CONTEXTS],
    id: `urn:uuid:${input.certificateId}`,
    type: ["VerifiableCredential", "OpenBadgeCredential"],
    issuer: { id: profile.id, type: profile.type, name: profile.name, url: profile.url },
    validFrom: dateTimeZ(input.issuedAt),
    name: `${input.courseTitle}: certificate of completion`,
    credentialSubject: {
      id: `urn:uuid:${input.subjectId}`,
      type: ["AchievementSubject"],
      identifier: [{ type: "IdentityObject", identityHash: identityHash(input.email.toLowerCase(), input.salt), identityType: "emailAddress", hashed: true, salt: input.salt }],
      achievement: {
        id: `${origin}/courses/${input.courseSlug}`,
        type: ["Achievement"],
        achievementType: "Certificate",
        name: input.courseTitle,
        description: input.courseSummary,
        criteria: { narrative: CRITERIA_NARRATIVE },
        humanCode: input.courseSlug,
      },
    },
    credentialStatus: {
      id: `${origin}${STATUS_LIST_PATH}#${input.statusListIndex}`,
      type: "BitstringStatusListEntry",
      statusPurpose: "revocation",
      statusListIndex: String(input.statusListIndex),
      statusListCredential: `${origin}${STATUS_LIST_PATH}`,
    },
  };
}

export type OpenBadgeCredential = ReturnType<typeof buildOpenBadgeCredential>;

/** The VC-JWT payload: the credential itself plus the registered claims OB 3.0 §8.2.3 requires. */
export function jwtPayloadOf(credential: { id: string; issuer: { id: string }; validFrom: string; credentialSubject: { id: string } }) {
  return {
    ...JSON.parse(JSON.stringify(credential)),
    iss: credential.issuer.id,
    jti: credential.id,
    nbf: Math.floor(Date.parse(credential.validFrom) / 1000),
    sub: credential.credentialSubject.id,
  } as Record<string, unknown>;
}
