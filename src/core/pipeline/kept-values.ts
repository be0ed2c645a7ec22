import { forgetKeptEnvelopes } from '../ride/ride-build.ts';
import { forgetRingValues } from '../model/wheel/kept-by-ring.ts';

// Some models keep what they computed by the values it was computed from
// (the wheel's path over a bump, the wheel ring's scans and stiffness), so a re-run that
// leaves those values alone takes it again. A first check in a process has
// none of it; the bench forgets them before each timed check so it times
// that check, not a repeat.

export function forgetKeptValues(): void {
  forgetKeptEnvelopes();
  forgetRingValues();
}
