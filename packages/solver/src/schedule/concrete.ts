/** Concrete in a fitting's restraint, m³: its bearing blocks and its gravity anchor (trench pads are bearing, not volume). */
export function restraintConcrete(r: {
  block: { concreteVolume: number } | null;
  reverseBlock: { concreteVolume: number } | null;
  anchor: { concreteVolume: number } | null;
}): number {
  return (r.block?.concreteVolume ?? 0) + (r.reverseBlock?.concreteVolume ?? 0) + (r.anchor?.concreteVolume ?? 0);
}
