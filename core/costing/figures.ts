/**
 * Figures in cost-line basis text. Every amount is worked to the cent from the figures its basis prints,
 * so the basis can be checked with a pencil: nothing charged is hidden by rounding in the text.
 */
export const cents = (v: number): number => Math.round(v * 100) / 100;

/** A price or rate as the shop entered it: two decimals, more when it has them (0.015 stays 0.015). */
export function rateText(v: number): string {
  const two = v.toFixed(2);
  return Number(two) === v ? two : String(Number(v.toPrecision(12)));
}

/** A quantity to at most `decimals` places, trailing zeros dropped (16.022 kg, 30 min). */
export const figure = (v: number, decimals: number): string => String(Number(v.toFixed(decimals)));

/** Rounds a quantity the same way its text shows it, so the charge uses the printed figure. */
export const rounded = (v: number, decimals: number): number => Number(v.toFixed(decimals));

export const moneyText = (v: number): string => v.toFixed(2);
