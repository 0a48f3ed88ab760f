// npm run bench:certificate: renders the certificate PDF (lib/certificates/pdf.ts) repeatedly and
// prints the median time and size per paper, against the goals of issue 13 (≤ 100 ms, ≤ 100 KB).
// Warm-up runs first (fonts read, code compiled); then BENCH_RUNS (default 30) timed runs each.
// Also prints the process CPU time per render, which a busy machine inflates less than wall time.
import { renderCertificatePdf, type Paper } from "@/lib/certificates/pdf";

const RUNS = Number(process.env.BENCH_RUNS ?? 30);
const input = {
  recipientName: "Sunniva Hale",
  courseTitle: "Miking the band",
  issuedAt: new Date("2027-05-14T10:20:00Z"),
  hours: 11.5,
  schoolName: "Kestrel Bay Audio School",
  instructorName: "Ines Calloway",
  code: "7KQ2M9XH4RTB",
  verifyUrl: "https://axisline.example/verify/7KQ2-M9XH-4RTB",
};

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function bench(paper: Paper) {
  for (let i = 0; i < 5; i++) await renderCertificatePdf({ ...input, paper });
  const wall: number[] = [];
  const cpu: number[] = [];
  let size = 0;
  for (let i = 0; i < RUNS; i++) {
    const c = process.cpuUsage();
    const t = performance.now();
    const bytes = await renderCertificatePdf({ ...input, paper });
    wall.push(performance.now() - t);
    const used = process.cpuUsage(c);
    cpu.push((used.user + used.system) / 1000);
    size = bytes.length;
  }
  return { paper, medianMs: median(wall), medianCpuMs: median(cpu), sizeKB: size / 1024 };
}

async function main() {
  const { loadavg, cpus } = await import("node:os");
  console.log(`bench:certificate: ${RUNS} renders per paper after 5 warm-up renders; load average ${loadavg()[0].toFixed(2)} on ${cpus().length} cores`);
  let ok = true;
  for (const paper of ["a4", "letter"] as const) {
    const r = await bench(paper);
    const pass = r.medianMs <= 100 && r.sizeKB <= 100;
    ok &&= pass;
    console.log(`  ${paper.padEnd(6)} median ${r.medianMs.toFixed(1)} ms (CPU ${r.medianCpuMs.toFixed(1)} ms), ${r.sizeKB.toFixed(1)} KB  ${pass ? "within" : "OUTSIDE"} the goal (≤ 100 ms, ≤ 100 KB)`);
  }
  if (!ok) process.exitCode = 1;
}

main().catch((err: Error) => {
  console.error(err.message);
  process.exitCode = 1;
});
