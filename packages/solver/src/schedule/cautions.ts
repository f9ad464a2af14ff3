/**
 * The usual cautions of utility specifications and the DIPRA manual (engineer's responsibility, undisturbed
 * soil, curing before the test — the curing time is attributed to AWWA C600, clause not verified), carried by
 * every printed schedule and opened from every result screen (each also shows shortCaution.ts).
 */
export const CAUTIONS: readonly string[] = [
  'Mainbrace is a design aid. Thrust restraint must be designed, checked and sealed by a licensed professional engineer and approved by the water utility or authority having jurisdiction.',
  'Local codes, the utility’s standards and its standard details govern over the generic values used here.',
  'Soil values are only as good as the soil identification: prefer site geotechnical data. Muck, peat, organic soils and unprepared fill have no bearing.',
  'Blocks must bear on undisturbed soil (or fill compacted to 90–95 % Standard Proctor), centred on the line of the thrust.',
  'Keep joints, bolts and glands clear of concrete; wrap fittings in polyethylene before pouring.',
  'Let block concrete cure before pressure testing (commonly 5 days; 2 days with high-early-strength cement).',
  'Brace caps, plugs and test bulkheads for the full test thrust during the field test; the test pressure must not exceed the thrust-restraint design pressure.',
  'Excavation behind a block later (other utilities) can remove its soil support: record blocks on the as-built drawings.',
  'Gravity anchors are sized for the highest groundwater level given; restrained zones of neighbouring fittings that overlap must be designed together.',
];

/**
 * The cautions every printed page carries (the full list goes in the print's appendix): design aid and
 * the licensed engineer's check, local codes and the utility's standards, undisturbed soil, concrete
 * clear of joints, curing before the test, and bracing for the field test, which the crew runs. The
 * schedule print, the crew sheet and the plan drawing all print these, so that no printed output
 * carries fewer.
 */
export const PAGE_CAUTIONS: readonly string[] = [0, 1, 3, 4, 5, 6].map((i) => CAUTIONS[i]!);

/** The cautions as a terminal table ends with them, one marked line each. */
export const cautionLines = (): string[] => CAUTIONS.map((c) => `! ${c}`);
