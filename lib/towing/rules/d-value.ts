/**
 * The D value of a mechanical coupling (UN Regulation No. 55): the theoretical reference force, in kN, between
 * the towing vehicle and the trailer.
 *
 *   D = g · T · R / (T + R)
 *
 * T: the towing vehicle's technically permissible maximum mass, in tonnes; R: the trailer's, in tonnes;
 * g = 9.81 m/s². Example: T 2.0 t, R 1.5 t → 9.81 × 2.0 × 1.5 / 3.5 = 8.41 kN.
 */
export const STANDARD_GRAVITY = 9.81;

/** D in kN from T and R in tonnes. Zero when either mass is zero. */
export function dValue(towingVehicleTonnes: number, trailerTonnes: number, g = STANDARD_GRAVITY): number {
  const sum = towingVehicleTonnes + trailerTonnes;
  if (!(sum > 0)) return 0;
  return (g * towingVehicleTonnes * trailerTonnes) / sum;
}
