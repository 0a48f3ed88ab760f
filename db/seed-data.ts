// The invented demo scenario: Kestrel Bay Audio School and its spring class. Every name is made up.
import type { Role } from "./schema";

export type SeedUser = { key: string; name: string; email: string; role: Role; password: string };

const DOMAIN = "kestrel-bay.example";

// Demo passwords are for the local demo only and are printed by the demo command.
export const DEMO_USERS: SeedUser[] = [
  { key: "admin", name: "Dana Okafor-Lind", email: `dana.admin@${DOMAIN}`, role: "admin", password: "lantern-room-admin" },
  { key: "ines", name: "Ines Calloway", email: `ines.calloway@${DOMAIN}`, role: "instructor", password: "lantern-room-teach" },
  { key: "tomasz", name: "Tomasz Reyland", email: `tomasz.reyland@${DOMAIN}`, role: "instructor", password: "lantern-room-teach" },
  { key: "harriet", name: "Harriet Quill", email: `harriet.quill@${DOMAIN}`, role: "school_manager", password: "lantern-room-office" },
  ...[
    "Ade Brightwater",
    "Lena Osei",
    "Marco Vint",
    "Sunniva Hale",
    "Kofi Marsh",
    "Yara Delmont",
    "Felix Oakes",
    "Mira Santel",
    "Callum Brede",
    "Noor Aziz",
    "Elias Fenwick",
    "June Halvorsen",
  ].map((name) => ({
    key: name.split(" ")[0].toLowerCase(),
    name,
    email: `${name.split(" ")[0].toLowerCase()}.${name.split(" ")[1].toLowerCase()}@${DOMAIN}`,
    role: "apprentice" as const,
    password: "lantern-room-learn",
  })),
];

export const DEMO_SCHOOL = { slug: "kestrel-bay-audio-school", name: "Kestrel Bay Audio School" };

export const DEMO_CLASSES = [
  {
    name: "Spring class: Miking the band",
    term: "Spring 2027",
    courseSlug: "miking-the-band",
    instructor: "ines",
    apprentices: ["ade", "lena", "marco", "sunniva", "kofi", "yara", "felix", "mira"],
    // Seats bought beyond the seated apprentices (one of them held by DEMO_INVITATION).
    freeSeats: 2,
  },
  {
    name: "Spring class: How microphones hear",
    term: "Spring 2027",
    courseSlug: "how-microphones-hear",
    instructor: "tomasz",
    apprentices: ["callum", "noor", "elias", "june", "ade"],
    freeSeats: 2,
  },
];

/** A newcomer invited to the spring class who hasn't answered yet. */
export const DEMO_INVITATION = { className: "Spring class: Miking the band", email: `rowan.pike@${DOMAIN}`, name: "Rowan Pike" };
