// The invitation to take a seat in a school's class. Rendered through the shared layout of templates.ts.
import { layout, type RenderedMail } from "./templates";

export type InvitationMailTemplate = {
  template: "class_invitation";
  /** The name from the roster, if it gave one. */
  name: string | null;
  schoolName: string;
  className: string;
  courseTitle: string;
  /** "11 December 2026" (UTC): the last day the link works. */
  expiresOn: string;
  url: string;
};

export function renderInvitationMail(m: InvitationMailTemplate): RenderedMail {
  const hello = m.name ? `Hello ${m.name},` : "Hello,";
  const what = `${m.schoolName} has a seat for you in the class "${m.className}" on the Axisline course ${m.courseTitle}.`;
  const how = "Open the link to accept it. If you have no Axisline account yet, you can create one there with this address.";
  const foot = `The link works once, until ${m.expiresOn}. If you weren't expecting it, ignore this message: nothing happens unless you accept.`;
  return {
    subject: `${m.schoolName} invites you to ${m.className} on Axisline`,
    text: `${hello}\n\n${what}\n\n${how}\n\n${m.url}\n\n${foot}\n`,
    html: layout("You're invited to a class", [hello, what, how], { label: "Accept the invitation", url: m.url }, foot),
  };
}
