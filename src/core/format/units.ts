/** Human units for messages and reports. Every function takes null and prints an em dash. */

const INTEGER = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** `131072` → `131,072`. */
export function formatInteger(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  return INTEGER.format(value);
}

/** Significant-digit formatting for ratios and radians, with exponent for tiny or huge values. */
export function formatNumber(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e7) {
    if (Number.isInteger(value)) return formatInteger(value);
    return String(Number(value.toPrecision(digits)));
  }
  return value.toExponential(digits - 1).replace('e+', 'e');
}

/** Tokens with a binary-k/M suffix when round: `131072` → `131,072 (128k)`. */
export function formatTokens(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const plain = formatInteger(value);
  const magnitude = Math.abs(value);
  if (magnitude >= 1024 * 1024 && magnitude % (1024 * 1024) === 0)
    return `${plain} (${value / (1024 * 1024)}M)`;
  if (magnitude >= 1024 && magnitude % 1024 === 0) return `${plain} (${value / 1024}k)`;
  return plain;
}

const BYTE_UNITS = ['B', 'KiB', 'MiB', 'GiB', 'TiB', 'PiB'];

/** Bytes in binary units, three significant digits: `524288` → `512 KiB`. */
export function formatBytes(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  let magnitude = Math.abs(value);
  let unit = 0;
  while (magnitude >= 1024 && unit < BYTE_UNITS.length - 1) {
    magnitude /= 1024;
    unit += 1;
  }
  const sign = value < 0 ? '-' : '';
  const digits = unit === 0 ? String(magnitude) : String(Number(magnitude.toPrecision(3)));
  return `${sign}${digits} ${BYTE_UNITS[unit]}`;
}

/** Large counts with a decimal suffix: `6738415616` → `6.74B`. */
export function formatCount(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const magnitude = Math.abs(value);
  for (const [size, suffix] of [
    [1e12, 'T'],
    [1e9, 'B'],
    [1e6, 'M'],
    [1e3, 'k'],
  ] as const) {
    if (magnitude >= size) return `${Number((value / size).toPrecision(3))}${suffix}`;
  }
  return formatInteger(value);
}

/** A signed percentage change from `before` to `after`, null when undefined. */
export function percentChange(before: number | null, after: number | null): number | null {
  if (before === null || after === null || !Number.isFinite(before) || !Number.isFinite(after))
    return null;
  if (before === 0) return after === 0 ? 0 : null;
  return ((after - before) / Math.abs(before)) * 100;
}
