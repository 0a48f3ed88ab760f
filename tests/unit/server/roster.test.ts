// Rosters and the office CSV. Sources: RFC 4180 (Common Format and MIME Type for CSV Files) §2
// rules 4–7 (fields separated by commas; a field with a comma, quote or line break is quoted; a
// quote inside is doubled; a quoted field may span lines); OWASP, "CSV Injection" (cells starting
// with = + - @, tab or carriage return are read as formulas; prefix them with a single quote).
import { describe, expect, it } from "vitest";
import { parse } from "csv-parse/sync";
import type { ClassOfficeDto } from "@/lib/dto/school-office";
import { classOfficeCsv, csvFileName, neutralizeCell } from "@/lib/server/office-csv";
import { MAX_ROSTER_ROWS, parseRosterCsv, parseTypedAddresses } from "@/lib/server/roster";

describe("typed addresses", () => {
  it("reads one per line, with or without a name, and numbers the lines as typed (blank lines count)", () => {
    const r = parseTypedAddresses("ada@example.com\n\nRobin Pike <ROBIN@example.com>\nsam@example.com, Sam Reed\nnope\n");
    expect(r.entries).toEqual([
      { line: 1, email: "ada@example.com", name: null },
      { line: 3, email: "robin@example.com", name: "Robin Pike" },
      { line: 4, email: "sam@example.com", name: "Sam Reed" },
    ]);
    expect(r.problems).toEqual([{ line: 5, email: "nope", problem: '"nope" is not a valid e-mail address.' }]);
  });

  it("reports a repeated address on its later line, naming the first", () => {
    expect(parseTypedAddresses("a@example.com\nA@Example.com").problems).toEqual([{ line: 2, email: "a@example.com", problem: "Duplicate: a@example.com is already on line 1." }]);
  });

  it(`refuses more than ${MAX_ROSTER_ROWS} people as a whole`, () => {
    const many = Array.from({ length: MAX_ROSTER_ROWS + 1 }, (_, i) => `p${i}@example.com`).join("\n");
    expect(parseTypedAddresses(many)).toMatchObject({ entries: [], problems: [{ line: 0 }] });
  });
});

describe("CSV rosters (RFC 4180)", () => {
  it("finds the email and name columns by header, in any order, and skips blank rows", () => {
    const r = parseRosterCsv("\uFEFFName,E-mail\r\nAda Lane,ada@example.com\r\n,\r\n\"Reed, Sam\",sam@example.com\r\n");
    expect(r.entries).toEqual([
      { line: 2, email: "ada@example.com", name: "Ada Lane" },
      { line: 4, email: "sam@example.com", name: "Reed, Sam" },
    ]);
  });

  it("numbers a record by the line it starts on when a quoted field spans lines (rule 6)", () => {
    const r = parseRosterCsv('email,name\na@example.com,"Two\nLines"\nbad,Third\n');
    expect(r.entries[0]).toMatchObject({ line: 2, name: "Two Lines" });
    expect(r.problems).toEqual([{ line: 4, email: "bad", problem: '"bad" is not a valid e-mail address.' }]);
  });

  it("reads a file without a header as address, name", () => {
    expect(parseRosterCsv("ada@example.com,Ada\n").entries).toEqual([{ line: 1, email: "ada@example.com", name: "Ada" }]);
  });

  it("says where the file stops being valid CSV", () => {
    const r = parseRosterCsv('email\n"ada@example.com\n');
    expect(r.entries).toEqual([]);
    expect(r.problems[0]).toMatchObject({ line: 2, problem: expect.stringContaining("valid CSV") });
  });
});

describe("the office CSV", () => {
  const office = {
    name: "Spring class: Miking the band",
    quizzes: [{ bankId: "b1", title: "Setup quiz" }],
    apprentices: [
      { userId: "u1", name: '=HYPERLINK("x")', email: "a@example.com", joinedAt: "2026-01-01T00:00:00.000Z", completedLessons: 2, totalLessons: 10, percent: 20, lastViewedAt: null, bestByBank: { b1: 80 }, started: true },
      { userId: "u2", name: 'Reed, "Sam"', email: "@b@example.com", joinedAt: "2026-01-02T00:00:00.000Z", completedLessons: 0, totalLessons: 10, percent: 0, lastViewedAt: null, bestByBank: {}, started: false },
    ],
  } as unknown as ClassOfficeDto;

  it("neutralises formula cells (OWASP) and quotes as RFC 4180 says, so a CSV reader gets the cells back", () => {
    for (const c of ["=1+1", "+1", "-1", "@x", "\tx", "\rx"]) expect(neutralizeCell(c)).toBe(`'${c}`);
    expect(neutralizeCell("Ada")).toBe("Ada");
    const text = classOfficeCsv(office);
    expect(text).toContain('"Reed, ""Sam"""'); // rules 6 and 7
    const rows = parse(text) as string[][]; // the reference reader
    expect(rows[0]).toEqual(["name", "email", "joined_utc", "lessons_completed", "lessons_total", "percent", "last_opened_utc", "best_percent: Setup quiz"]);
    expect(rows[1]).toEqual(["'=HYPERLINK(\"x\")", "a@example.com", "2026-01-01T00:00:00.000Z", "2", "10", "20", "", "80"]);
    expect(rows[2]).toEqual(['Reed, "Sam"', "'@b@example.com", "2026-01-02T00:00:00.000Z", "0", "10", "0", "", ""]);
    expect(csvFileName(office)).toBe("spring-class-miking-the-band-roster.csv");
  });
});
