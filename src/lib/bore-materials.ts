// Bore materials a job or a rate row names (DESIGN.md §3). Shared by the jobs intake and the stone
// rate table, so both speak of one list.
export const BORE_MATERIALS = [
  { code: "grey_iron", label: "Grey cast iron", honable: true },
  { code: "cgi", label: "Compacted graphite iron", honable: true },
  { code: "ductile_iron", label: "Ductile iron", honable: true },
  { code: "al_iron_liner", label: "Aluminium block with iron liners", honable: true },
  { code: "steel_liner", label: "Steel liners", honable: true },
  { code: "hypereutectic_al", label: "Hypereutectic aluminium", honable: true },
  // Coated bores (thermal spray, nickel-silicon carbide and the like) need the coating maker's process.
  { code: "coated", label: "Coated bore (not for conventional stones)", honable: false },
] as const;

export type BoreMaterial = (typeof BORE_MATERIALS)[number]["code"];
export const BORE_MATERIAL_CODES = BORE_MATERIALS.map((m) => m.code) as [BoreMaterial, ...BoreMaterial[]];

export function boreMaterialLabel(code: BoreMaterial): string {
  return BORE_MATERIALS.find((m) => m.code === code)?.label ?? code;
}
