/**
 * An empty dictionary without a prototype, for tables keyed by names read from files: a key such
 * as `__proto__` or `constructor` is then a plain key, never an inherited property.
 */
export function nullRecord<T>(): Record<string, T> {
  return Object.create(null) as Record<string, T>;
}
