// °C and °F for temperatures and for degree-day totals, which convert differently.

export function celsiusToFahrenheit(c: number): number {
  return c * 1.8 + 32;
}

export function fahrenheitToCelsius(f: number): number {
  return (f - 32) / 1.8;
}

/** A degree-day total is a temperature difference, so it scales without the 32° offset. */
export function degreeDaysToFahrenheit(celsiusDegreeDays: number): number {
  return celsiusDegreeDays * 1.8;
}

export function degreeDaysToCelsius(fahrenheitDegreeDays: number): number {
  return fahrenheitDegreeDays / 1.8;
}
