import { findingsOf, readDemo } from './tests/support/fixtures.ts';
for (const d of ['demo-two-crew', 'demo-rear-axle', 'teaching-flawed']) {
  const f = (await findingsOf('member.frame-rail', readDemo(d)))[0];
  console.log(d, f.severity, f.subject, f.value, f.limit, f.load_case, f.message);
}
const f = (await findingsOf('member.frame-rail', readDemo('demo-two-crew')))[0];
console.log(f.working_text);
