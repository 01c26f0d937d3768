/** Temperature profiles along the tube path for plots. */
import type { Bundle } from './tube-side';

export interface ProfilePoint {
  x_m: number;
  process_C: number;
  coolant_C?: number;
}

/**
 * One tube pass: the exact counterflow profile with constant U
 * (ΔT(x) = ΔT₀ e^{−UA(1/C_h − 1/C_c) x/L}, process entering at x = 0, coolant at x = L).
 * Several passes: the process temperature along its whole path, decaying exponentially towards the
 * mean coolant temperature and matched to the computed outlet (an approximation for plotting; the
 * coolant is not drawn because in a 1–2 shell it has no single position along the tube path).
 */
export function coolantProfile(
  n: number,
  b: Bundle,
  tHin: number,
  tHout: number,
  tCin: number,
  tCout: number,
  ua: number,
  ch: number,
  cc: number,
): ProfilePoint[] {
  const out: ProfilePoint[] = [];
  if (b.passes === 1) {
    const a = 1 / ch - 1 / cc;
    const dt0 = tHin - tCout;
    for (let i = 0; i < n; i++) {
      const frac = i / (n - 1);
      const q = Math.abs(a * ua) < 1e-12 ? dt0 * ua * frac : (dt0 * -Math.expm1(-a * ua * frac)) / a;
      out.push({ x_m: b.length * frac, process_C: tHin - q / ch, coolant_C: tCout - q / cc });
    }
    return out;
  }
  const tc = 0.5 * (tCin + tCout);
  const ratio = (tHout - tc) / (tHin - tc);
  const path = b.passes * b.length;
  for (let i = 0; i < n; i++) {
    const frac = i / (n - 1);
    out.push({ x_m: path * frac, process_C: ratio > 0 ? tc + (tHin - tc) * Math.pow(ratio, frac) : tHin + (tHout - tHin) * frac });
  }
  return out;
}
