/**
 * A derived value remembered per key object (a document array, a map of positions) for as long as the
 * other things it was made from stay the same objects. The key's entry goes with the key.
 */
export function keptPer<K extends object, R>() {
  const cache = new WeakMap<K, { deps: readonly unknown[]; out: R }>();
  return (key: K, deps: readonly unknown[], make: () => R): R => {
    const known = cache.get(key);
    if (known && known.deps.length === deps.length && known.deps.every((d, i) => d === deps[i])) return known.out;
    const out = make();
    cache.set(key, { deps, out });
    return out;
  };
}
