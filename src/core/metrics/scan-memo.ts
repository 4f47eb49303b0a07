/**
 * A run's memory of positional computations: each distinct computation is done once per run
 * and its result handed out again for every later file, version or remedy proof that asks the
 * same thing (monorepos repeat a few position codes across hundreds of configs, and a head
 * whose position code and span did not change asks what its base asked).
 *
 * The key is the computation's name and a stable serialisation of every argument it is called
 * with (typed arrays bit for bit, objects by sorted keys), so it covers whatever the computation
 * reads: a new field that changes the frequencies changes the arrays, and a new argument is part
 * of the key without anyone listing it. A memoised function must be pure: its result depends on
 * its arguments alone. Results are shared, so callers must not change them.
 */

export interface ScanMemo {
  /** `fn(...args)`, computed once per distinct `name` and arguments within this memo. */
  call<A extends unknown[], R>(name: string, fn: (...args: A) => R, ...args: A): R;
  /** Computations answered from memory, and computed. */
  readonly hits: number;
  readonly misses: number;
}

/**
 * A typed array's bytes, exactly (NaN payloads and the sign of zero included), as a string of
 * one UTF-16 code unit per 16-bit word (per byte when the view is not 2-byte aligned), after its
 * length: the length makes the key unambiguous inside a longer one, and no number is printed.
 */
function bytesKey(view: ArrayBufferView): string {
  const aligned = view.byteLength % 2 === 0 && view.byteOffset % 2 === 0;
  const units = aligned
    ? new Uint16Array(view.buffer, view.byteOffset, view.byteLength / 2)
    : new Uint8Array(view.buffer, view.byteOffset, view.byteLength);
  let out = '';
  for (let i = 0; i < units.length; i += BYTES_KEY_CHUNK) {
    out += String.fromCharCode.apply(
      null,
      units.subarray(i, i + BYTES_KEY_CHUNK) as unknown as number[],
    );
  }
  return `${aligned ? 'h' : 'b'}${view.byteLength}:${out}`;
}

/** Code units turned into a string per call (well under engines' argument limits). */
const BYTES_KEY_CHUNK = 8192;

/**
 * A string naming `value` exactly: equal strings for equal inputs of a pure computation. Numbers
 * keep the sign of zero; typed arrays their class and bits; plain objects their keys sorted;
 * `undefined` and absent object keys differ. Functions and symbols are refused (a computation
 * that takes them cannot be keyed by value).
 */
export function stableKey(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'undefined':
      return 'u';
    case 'boolean':
      return value ? 't' : 'f';
    case 'number':
      return Object.is(value, -0) ? 'n-0' : `n${value}`;
    case 'bigint':
      return `b${value}`;
    case 'string':
      return JSON.stringify(value);
    case 'object': {
      if (ArrayBuffer.isView(value)) return `${value.constructor.name}<${bytesKey(value)}>`;
      if (Array.isArray(value)) return `[${value.map(stableKey).join(',')}]`;
      const entries = Object.keys(value)
        .sort()
        .map(
          (key) => `${JSON.stringify(key)}:${stableKey((value as Record<string, unknown>)[key])}`,
        );
      return `{${entries.join(',')}}`;
    }
    default:
      throw new TypeError(
        `stableKey: a ${typeof value} cannot be part of a memo key; expected numbers, strings, arrays, typed arrays or plain objects`,
      );
  }
}

/** A memo for one run (a gate over a pull request, or one `inspect`): nothing is kept across runs. */
export function createScanMemo(): ScanMemo {
  const results = new Map<string, unknown>();
  let hits = 0;
  let misses = 0;
  return {
    call(name, fn, ...args) {
      const key = `${name}(${args.map(stableKey).join(',')})`;
      if (results.has(key)) {
        hits += 1;
        return results.get(key) as ReturnType<typeof fn>;
      }
      misses += 1;
      const result = fn(...args);
      results.set(key, result);
      return result;
    },
    get hits() {
      return hits;
    },
    get misses() {
      return misses;
    },
  };
}

/** `fn(...args)` through `memo` when there is one, else directly. */
export function viaMemo<A extends unknown[], R>(
  memo: ScanMemo | undefined,
  name: string,
  fn: (...args: A) => R,
  ...args: A
): R {
  return memo ? memo.call(name, fn, ...args) : fn(...args);
}
