/** The closed choices of the project format (project-format.md), shared by the schema and the screens. */
export const MATERIALS = ['ductile-iron', 'pvc', 'hdpe', 'steel', 'other'] as const;
export const END_CONDITIONS = ['cap', 'tie-in'] as const;
export const CASE_KINDS = ['working', 'surge', 'test', 'other'] as const;
export const RESTRAINT_METHODS = ['block', 'joints'] as const;
export const ENCASEMENTS = ['none', 'polyethylene'] as const;
