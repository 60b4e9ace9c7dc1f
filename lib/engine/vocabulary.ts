export const MATERIALS = [
  "cast_iron",
  "vitrified_clay",
  "concrete",
  "bituminous_fibre",
  "abs",
  "pvc",
  "ductile_iron",
  "hdpe",
  "unknown",
] as const;
export type Material = (typeof MATERIALS)[number];

export const MATERIAL_LABELS: Record<Material, string> = {
  cast_iron: "cast iron",
  vitrified_clay: "clay",
  concrete: "concrete",
  bituminous_fibre: "bituminous fibre",
  abs: "ABS plastic",
  pvc: "PVC",
  ductile_iron: "ductile iron",
  hdpe: "HDPE",
  unknown: "unknown material",
};

export const ACCESS_KINDS = ["cleanout_inside", "cleanout_outside", "toilet_removed", "roof_vent", "other"] as const;
export type AccessKind = (typeof ACCESS_KINDS)[number];

export const ACCESS_LABELS: Record<AccessKind, string> = {
  cleanout_inside: "the cleanout inside the house",
  cleanout_outside: "the cleanout outside the house",
  toilet_removed: "a toilet drain (toilet pulled)",
  roof_vent: "the roof vent",
  other: "the access point",
};

export const SURVEY_END_REASONS = ["reached_main", "blocked", "could_not_pass", "cable_end", "other"] as const;
export type SurveyEndReason = (typeof SURVEY_END_REASONS)[number];

export const SURVEY_END_LABELS: Record<SurveyEndReason, string> = {
  reached_main: "reached the main",
  blocked: "the line was blocked",
  could_not_pass: "the camera could not pass",
  cable_end: "the camera cable ran out",
  other: "the survey ended",
};

/** How the camera's run ended, to follow "The camera went 74 ft from the cleanout ...". */
export const SURVEY_END_PHRASES: Record<SurveyEndReason, string> = {
  reached_main: "and reached the main",
  blocked: "and was stopped by a blockage",
  could_not_pass: "and could not get any further",
  cable_end: "before its cable ran out",
  other: "before the survey ended",
};

/** A survey that stopped at something in the pipe, rather than at its end or the cable's. */
export const STOPPED_IN_LINE: readonly SurveyEndReason[] = ["blocked", "could_not_pass"];

export const SURFACES = ["soil", "hardscape", "street", "under_building"] as const;
export type Surface = (typeof SURFACES)[number];

export const SURFACE_LABELS: Record<Surface, string> = {
  soil: "lawn or soil",
  hardscape: "concrete or pavers",
  street: "the street",
  under_building: "under the building",
};

export type Side = "private" | "public";
