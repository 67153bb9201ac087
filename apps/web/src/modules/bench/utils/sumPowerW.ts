// Total electrical power of the drive rows.

/** Sum of `powerW` over the rows, W (every heater is driven at once on the bench). */
export function sumPowerW(rows: readonly { powerW: number }[]): number {
  return rows.reduce((sum, r) => sum + r.powerW, 0);
}
