/**
 * Finding types in the trade's plain words. Each belongs to one group:
 * - structural: the pipe itself is damaged or out of line; it does not get better by cleaning.
 * - service: something in or entering the pipe that hinders flow; cleaning can remove it,
 *   though it may come back.
 * Material and diameter changes are not findings: the line profile's segments carry them.
 */
export type FindingGroup = "structural" | "service";

export interface FindingTypeInfo {
  /** Buyer-facing name, as a heading or list item. */
  readonly label: string;
  /** The same in running text. */
  readonly word: string;
  readonly group: FindingGroup;
  readonly plural: string;
}

export const FINDING_TYPES = {
  crack: { word: "crack", label: "Crack", plural: "cracks", group: "structural" },
  fracture: { word: "fracture", label: "Fracture", plural: "fractures", group: "structural" },
  break_or_hole: { word: "break or hole", label: "Break or hole", plural: "breaks or holes", group: "structural" },
  deformation: { word: "deformation", label: "Deformed pipe", plural: "deformed stretches", group: "structural" },
  collapse: { word: "collapse", label: "Collapse", plural: "collapses", group: "structural" },
  offset_joint: { word: "offset joint", label: "Offset joint", plural: "offset joints", group: "structural" },
  separated_joint: { word: "separated joint", label: "Separated joint", plural: "separated joints", group: "structural" },
  // A sag is a fault of alignment (IPC 704.1 asks for uniform slope), so structural,
  // even though what the owner notices is the standing water.
  sag: { word: "sag", label: "Sag (belly)", plural: "sags", group: "structural" },
  poor_connection: {
    word: "poor connection to the main",
    label: "Poor connection to the main",
    plural: "poor connections",
    group: "structural",
  },
  // Corrosion takes wall off iron pipe; the scale it leaves is the visible part of that loss.
  corrosion_or_scale: { word: "corrosion or scale", label: "Corrosion or scale", plural: "corroded stretches", group: "structural" },
  roots: { word: "roots", label: "Roots", plural: "root intrusions", group: "service" },
  deposits: { word: "deposits", label: "Deposits", plural: "deposits", group: "service" },
  grease: { word: "grease", label: "Grease", plural: "grease build-ups", group: "service" },
  infiltration: { word: "infiltration", label: "Groundwater seeping in", plural: "infiltration points", group: "service" },
  obstruction: { word: "obstruction", label: "Obstruction", plural: "obstructions", group: "service" },
  // Unclassified observations are graded but never steer a structural repair.
  other: { word: "other finding", label: "Other", plural: "other findings", group: "service" },
} as const satisfies Record<string, FindingTypeInfo>;

export type FindingType = keyof typeof FINDING_TYPES;

export const FINDING_TYPE_IDS = Object.keys(FINDING_TYPES) as [FindingType, ...FindingType[]];

export const findingGroup = (type: FindingType): FindingGroup => FINDING_TYPES[type].group;
export const findingLabel = (type: FindingType): string => FINDING_TYPES[type].label;
export const findingWord = (type: FindingType): string => FINDING_TYPES[type].word;

/** Things a cleaning crew removes before any liner goes in. */
export const CLEARED_BEFORE_LINING: readonly FindingType[] = ["roots", "deposits", "grease", "obstruction", "corrosion_or_scale"];

/** Types whose lossPct is a share of the cross-section lost. */
export const LOSS_OF_AREA_TYPES: readonly FindingType[] = ["roots", "deposits", "grease", "obstruction", "corrosion_or_scale"];
