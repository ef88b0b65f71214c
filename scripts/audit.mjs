#!/usr/bin/env node
// Audits the dependencies with npm's advisory service: fails on any high or critical advisory
// that audit-exceptions.json does not explain, and says plainly when the service cannot be
// reached (then nothing has been audited).
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';

const result = spawnSync('npm', ['audit', '--json'], { encoding: 'utf8', shell: false });
let report;
try {
  report = JSON.parse(result.stdout);
} catch {
  console.error(`audit: npm audit gave no report (exit ${result.status}): ${result.stderr.trim()}`);
  process.exit(3);
}
if (report.statusCode !== undefined || report.error !== undefined) {
  console.error(
    `audit: the advisory service could not be reached (${report.message ?? report.statusCode}); the dependencies were NOT audited`,
  );
  process.exit(3);
}
// Exceptions name advisories, not packages, so a new advisory is never covered by an old note:
// { "<advisory url>": "why it does not apply here" }.
const explained = existsSync('audit-exceptions.json')
  ? JSON.parse(readFileSync('audit-exceptions.json', 'utf8'))
  : {};
const advisories = Object.values(report.vulnerabilities ?? {})
  .flatMap((entry) => entry.via.filter((via) => typeof via === 'object'))
  .filter((advisory) => advisory.severity === 'high' || advisory.severity === 'critical');
const unexplained = advisories.filter((advisory) => !(advisory.url in explained));
for (const advisory of advisories) {
  const why = explained[advisory.url];
  console.log(
    `${advisory.severity} ${advisory.name} ${advisory.range}: ${advisory.title} ${advisory.url}${why ? ` (explained: ${why})` : ''}`,
  );
}
const counts = report.metadata?.vulnerabilities ?? {};
console.log(`audit: ${JSON.stringify(counts)}; ${unexplained.length} high or critical unexplained`);
process.exit(unexplained.length === 0 ? 0 : 1);
