// The class invitation mail: the link in both parts, the expiry day, and names from a roster
// escaped in the HTML part (a roster is typed by people, and what they type must stay text, never markup).
import { describe, expect, it } from "vitest";
import { renderMail } from "@/lib/email/templates";

const url = "http://127.0.0.1:3000/invitations/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA";

describe("class_invitation mail", () => {
  it("carries the link, the school, the class and the last day", () => {
    const m = renderMail({ template: "class_invitation", name: "Robin Pike", schoolName: "Kestrel Bay Audio School", className: "Spring class", courseTitle: "Miking the band", expiresOn: "11 December 2026", url });
    expect(m.subject).toBe("Kestrel Bay Audio School invites you to Spring class on Axisline");
    expect(m.text).toContain(`\n${url}\n`);
    expect(m.text).toContain("Hello Robin Pike,");
    expect(m.text).toContain("until 11 December 2026");
    expect(m.html).toContain(`href="${url}"`);
  });

  it("greets without a name and escapes markup from a roster", () => {
    const m = renderMail({ template: "class_invitation", name: null, schoolName: "A&B <School>", className: '"Class"', courseTitle: "Miking the band", expiresOn: "1 January 2027", url });
    expect(m.text).toContain("Hello,\n");
    expect(m.html).toContain("A&amp;B &lt;School&gt;");
    expect(m.html).not.toContain("<School>");
  });
});
