import "server-only";
// Reading a roster: addresses typed into a box, or a CSV file (RFC 4180, parsed by csv-parse).
// Pure: it knows nothing of the class. Every entry keeps the line it came from, so whatever is
// wrong with it can be reported as "line 7: …"; checks against the class (already seated, already
// invited, free seats) are made by lib/server/invitations.ts on these entries.
import { parse } from "csv-parse/sync";
import { z } from "zod";
import type { RosterProblem } from "@/lib/dto/school-office";

export type RosterEntry = { line: number; email: string; name: string | null };
export type ParsedRoster = { entries: RosterEntry[]; problems: RosterProblem[] };

/** At most this many addresses in one roster (one mail each; the sending limit is in rate-limit.ts). */
export const MAX_ROSTER_ROWS = 200;
/** Bytes of CSV or typed text accepted at once: 200 rows of address and name fit many times over. */
export const MAX_ROSTER_BYTES = 64 * 1024;

const Email = z.email().max(254);
const EMAIL_HEADERS = ["email", "e-mail", "email address", "e-mail address", "address"];
const NAME_HEADERS = ["name", "full name", "apprentice", "apprentice name"];

function entryFrom(line: number, rawEmail: string, rawName: string | null, problems: RosterProblem[]): RosterEntry | null {
  const email = rawEmail.trim().toLowerCase();
  // A name reaches plain-text mail: no control characters or line breaks (as nameField in lib/validation/account.ts).
  const name = rawName?.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, " ").trim().slice(0, 120) || null;
  if (!email) {
    problems.push({ line, email: "", problem: "There is no e-mail address on this line." });
    return null;
  }
  if (!Email.safeParse(email).success) {
    problems.push({ line, email, problem: `"${email.slice(0, 80)}" is not a valid e-mail address.` });
    return null;
  }
  return { line, email, name };
}

/** Marks the second and later lines that repeat an address. */
function markDuplicates(entries: RosterEntry[], problems: RosterProblem[]): RosterEntry[] {
  const firstLine = new Map<string, number>();
  return entries.filter((e) => {
    const first = firstLine.get(e.email);
    if (first !== undefined) {
      problems.push({ line: e.line, email: e.email, problem: `Duplicate: ${e.email} is already on line ${first}.` });
      return false;
    }
    firstLine.set(e.email, e.line);
    return true;
  });
}

function finish(entries: RosterEntry[], problems: RosterProblem[]): ParsedRoster {
  const unique = markDuplicates(entries, problems);
  if (unique.length + problems.length > MAX_ROSTER_ROWS) {
    return { entries: [], problems: [{ line: 0, email: "", problem: `A roster can hold at most ${MAX_ROSTER_ROWS} people at a time. Split it into smaller lists.` }] };
  }
  problems.sort((a, b) => a.line - b.line);
  return { entries: unique, problems };
}

/** One address per line, optionally as `Name <address>` or `address, Name`; blank lines are skipped. */
export function parseTypedAddresses(text: string): ParsedRoster {
  const entries: RosterEntry[] = [];
  const problems: RosterProblem[] = [];
  text.split(/\r\n|\r|\n/).forEach((raw, index) => {
    const line = index + 1;
    const value = raw.trim();
    if (!value) return;
    const angled = /^(.*)<([^>]*)>\s*$/.exec(value);
    const [email, name] = angled ? [angled[2], angled[1].replace(/^["']|["']$/g, "")] : [value.split(/[,;\t]/)[0], value.split(/[,;\t]/).slice(1).join(" ")];
    const entry = entryFrom(line, email, name, problems);
    if (entry) entries.push(entry);
  });
  return finish(entries, problems);
}

type CsvRecord = { record: string[]; info: { lines: number } };

/**
 * A CSV roster. The first row is a header naming an e-mail column ("email", "e-mail", …) and
 * optionally a name column; without such a header the first column is the address and the second
 * the name. A record's line is the line it starts on (a quoted name may span lines).
 */
export function parseRosterCsv(text: string): ParsedRoster {
  let records: CsvRecord[];
  try {
    records = parse(text, { info: true, bom: true, skip_empty_lines: true, relax_column_count: true, trim: true }) as unknown as CsvRecord[];
  } catch (err) {
    const line = typeof (err as { lines?: unknown }).lines === "number" ? (err as { lines: number }).lines : 0;
    return { entries: [], problems: [{ line, email: "", problem: "The file stops being valid CSV here (check the quotes on this line)." }] };
  }
  if (records.length === 0) return { entries: [], problems: [{ line: 0, email: "", problem: "The file has no rows." }] };
  const startLine = (r: CsvRecord) => r.info.lines - r.record.join("").split(/\r\n|\r|\n/).length + 1;
  const header = records[0].record.map((h) => h.trim().toLowerCase());
  const emailColumn = header.findIndex((h) => EMAIL_HEADERS.includes(h));
  const hasHeader = emailColumn >= 0;
  const nameColumn = hasHeader ? header.findIndex((h) => NAME_HEADERS.includes(h)) : 1;
  const entries: RosterEntry[] = [];
  const problems: RosterProblem[] = [];
  for (const r of hasHeader ? records.slice(1) : records) {
    const cells = r.record;
    if (cells.every((c) => c === "")) continue;
    const entry = entryFrom(startLine(r), cells[hasHeader ? emailColumn : 0] ?? "", nameColumn >= 0 ? (cells[nameColumn] ?? null) : null, problems);
    if (entry) entries.push(entry);
  }
  if (entries.length === 0 && problems.length === 0) return { entries: [], problems: [{ line: 0, email: "", problem: "The file has a header but no people." }] };
  return finish(entries, problems);
}
