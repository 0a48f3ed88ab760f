// The message a graduate gets when their certificate is issued. Rendered through the shared
// layout of templates.ts.
import { layout, type RenderedMail } from "./templates";

export type CertificateMailTemplate = {
  template: "certificate_issued";
  name: string;
  courseTitle: string;
  /** XXXX-XXXX-XXXX */
  code: string;
  verifyUrl: string;
  pageUrl: string;
};

export function renderCertificateMail(m: CertificateMailTemplate): RenderedMail {
  return {
    subject: `Your Axisline certificate: ${m.courseTitle}`,
    text: `Hello ${m.name},\n\nCongratulations: you have completed ${m.courseTitle}, and your certificate is issued.\n\nVerification code: ${m.code}\nAnyone can check it at ${m.verifyUrl}\n\nDownload the PDF and the signed digital credential from ${m.pageUrl}\n`,
    html: layout(
      "Your certificate is issued",
      [`Hello ${m.name},`, `Congratulations: you have completed ${m.courseTitle}, and your certificate is issued.`, `Verification code: ${m.code}. Anyone can check it at ${m.verifyUrl}.`],
      { label: "Download your certificate", url: m.pageUrl },
      "The page also has the signed digital credential (Open Badges 3.0) for a wallet or an employer.",
    ),
  };
}
