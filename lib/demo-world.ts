import type { OrderStatus, Role } from "@/db/schema";

// Everything here is invented: the town, its streets, its people and their companies.

export const DEMO_TOWN = { city: "Harrow Falls", state: "OR", timeZone: "America/Los_Angeles" };

type DemoUser = {
  email: string;
  name: string;
  role: Role;
  company?: string;
  phone?: string;
  inspector?: { licence: string; licenceExpiresOn: string; base: string; postalCodes: string[]; verified: boolean };
};

export const DEMO_USERS: DemoUser[] = [
  { email: "admin@gradeline.test", name: "Wren Okafor", role: "admin", company: "Gradeline" },
  { email: "agent@gradeline.test", name: "Dana Whitcomb", role: "agent", company: "Millrace Realty", phone: "555-0141" },
  { email: "agent2@gradeline.test", name: "Marcus Ebbing", role: "agent", company: "Tannery Row Homes", phone: "555-0142" },
  { email: "agent3@gradeline.test", name: "Ines Halvorsen", role: "agent", company: "Quarry Hill Property Group", phone: "555-0143" },
  {
    email: "inspector@gradeline.test",
    name: "Theo Marsh",
    role: "inspector",
    company: "Marsh Line Services",
    inspector: { licence: "HF-PLB-20417", licenceExpiresOn: "2028-06-30", base: "Harrow Falls", postalCodes: ["97990", "97991", "97992"], verified: true },
  },
  {
    email: "inspector2@gradeline.test",
    name: "Rosa Kettering",
    role: "inspector",
    company: "Kettering Drain & Scope",
    inspector: { licence: "HF-PLB-31188", licenceExpiresOn: "2027-11-30", base: "Alder Bend", postalCodes: ["97991", "97993"], verified: true },
  },
  {
    email: "inspector3@gradeline.test",
    name: "Samir Oduya",
    role: "inspector",
    company: "Lantern Street Plumbing",
    inspector: { licence: "HF-PLB-27750", licenceExpiresOn: "2027-03-31", base: "Cooper's Ford", postalCodes: ["97994", "97990"], verified: true },
  },
  {
    email: "inspector4@gradeline.test",
    name: "Greta Pell",
    role: "inspector",
    company: "Pell Pipe Camera",
    inspector: { licence: "HF-PLB-40022", licenceExpiresOn: "2028-01-31", base: "Harrow Falls", postalCodes: ["97992"], verified: false },
  },
  { email: "buyer@gradeline.test", name: "Jordan Avery", role: "buyer" },
  { email: "buyer2@gradeline.test", name: "Kai Morrow", role: "buyer" },
  { email: "buyer3@gradeline.test", name: "Lena Brightwater", role: "buyer" },
];

type DemoOrder = {
  street: string;
  postalCode: string;
  propertyType: string;
  yearBuilt: number;
  status: OrderStatus;
  agent: string;
  inspector?: string;
  buyer: { name: string; email: string };
  occupancy: string;
  accessNotes: string;
  cleanoutKnown: boolean;
  cleanoutNote?: string;
  createdAt: Date;
  deadline: Date;
  visitWindows: { start: string; end: string }[];
  appointment?: { start: Date; end: Date };
  priceCents: number;
  priceLines: { label: string; cents: number }[];
};

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

export function demoOrders(now: Date): DemoOrder[] {
  const t = (ms: number) => new Date(now.getTime() + ms);
  const windows = (fromDays: number) => [
    { start: t(fromDays * DAY).toISOString(), end: t(fromDays * DAY + 8 * HOUR).toISOString() },
    { start: t((fromDays + 1) * DAY).toISOString(), end: t((fromDays + 1) * DAY + 8 * HOUR).toISOString() },
  ];
  const base = { label: "Sewer scope", cents: 32500 };
  const noCleanout = { label: "No known cleanout", cents: 7500 };
  const rush = { label: "Rush (deadline under 48 hours)", cents: 9500 };
  const price = (...lines: { label: string; cents: number }[]) => ({ priceLines: lines, priceCents: lines.reduce((s, l) => s + l.cents, 0) });
  const jordan = { name: "Jordan Avery", email: "buyer@gradeline.test" };
  const kai = { name: "Kai Morrow", email: "buyer2@gradeline.test" };
  const lena = { name: "Lena Brightwater", email: "buyer3@gradeline.test" };
  const appointment = (inMs: number) => ({ start: t(inMs), end: t(inMs + 2 * HOUR) });
  const common = { propertyType: "single_family", occupancy: "owner", cleanoutKnown: true, cleanoutNote: "Outside cleanout by the north hose bib." };

  return [
    { ...common, street: "14 Millrace Lane", postalCode: "97991", yearBuilt: 1948, status: "open", agent: "agent@gradeline.test", buyer: jordan, accessNotes: "Lockbox on the side gate, code from the listing agent.", createdAt: t(-2 * HOUR), deadline: t(6 * DAY), visitWindows: windows(1), ...price(base) },
    { ...common, street: "203 Tannery Row", postalCode: "97991", yearBuilt: 1926, status: "open", agent: "agent2@gradeline.test", buyer: kai, cleanoutKnown: false, cleanoutNote: undefined, occupancy: "tenant", accessNotes: "Tenant home weekdays after 3 pm; call 555-0177 first.", createdAt: t(-5 * HOUR), deadline: t(40 * HOUR), visitWindows: windows(0.5), ...price(base, noCleanout, rush) },
    { ...common, street: "7 Ferrule Court", postalCode: "97991", yearBuilt: 1962, status: "open", agent: "agent@gradeline.test", buyer: lena, occupancy: "vacant", accessNotes: "Vacant. Lockbox on the front door.", createdAt: t(-14 * HOUR), deadline: t(9 * DAY), visitWindows: windows(2), ...price(base) },
    { ...common, street: "88 Alder Bend Drive", postalCode: "97993", yearBuilt: 1971, status: "open", agent: "agent3@gradeline.test", buyer: kai, accessNotes: "Seller present; ring the bell.", createdAt: t(-1 * HOUR), deadline: t(8 * DAY), visitWindows: windows(2), ...price(base) },
    { ...common, street: "31 Quarry Hill Road", postalCode: "97990", yearBuilt: 1955, status: "accepted", agent: "agent@gradeline.test", inspector: "inspector@gradeline.test", buyer: jordan, accessNotes: "Lockbox on the garage side door.", createdAt: t(-1 * DAY), deadline: t(5 * DAY), visitWindows: windows(1), ...price(base) },
    { ...common, street: "5 Kilnworks Lane", postalCode: "97992", yearBuilt: 1939, status: "scheduled", agent: "agent2@gradeline.test", inspector: "inspector@gradeline.test", buyer: lena, accessNotes: "Owner will meet you.", createdAt: t(-2 * DAY), deadline: t(3 * DAY), visitWindows: windows(1), appointment: appointment(1 * DAY + 2 * HOUR), ...price(base) },
    { ...common, street: "119 Bellwether Avenue", postalCode: "97994", yearBuilt: 1958, status: "scheduled", agent: "agent3@gradeline.test", inspector: "inspector3@gradeline.test", buyer: kai, accessNotes: "Lockbox on the rear door.", createdAt: t(-3 * DAY), deadline: t(30 * HOUR), visitWindows: windows(0.2), appointment: appointment(36 * HOUR), ...price(base, rush) },
    { ...common, street: "42 Sluice Gate Way", postalCode: "97991", yearBuilt: 1952, status: "delivered", agent: "agent@gradeline.test", inspector: "inspector2@gradeline.test", buyer: jordan, accessNotes: "Cleanout in the basement utility room.", createdAt: t(-6 * DAY), deadline: t(2 * DAY), visitWindows: windows(-4), appointment: appointment(-3 * DAY), ...price(base) },
    { ...common, street: "260 Cooper's Ford Road", postalCode: "97990", yearBuilt: 1931, status: "unlocked", agent: "agent@gradeline.test", inspector: "inspector@gradeline.test", buyer: jordan, accessNotes: "Vacant; lockbox on the porch rail.", createdAt: t(-12 * DAY), deadline: t(-2 * DAY), visitWindows: windows(-10), appointment: appointment(-9 * DAY), ...price(base, noCleanout) },
    { ...common, street: "9 Lantern Street", postalCode: "97994", yearBuilt: 1964, status: "delivered", agent: "agent3@gradeline.test", inspector: "inspector3@gradeline.test", buyer: lena, accessNotes: "Call the owner on arrival.", createdAt: t(-5 * DAY), deadline: t(1 * DAY), visitWindows: windows(-3), appointment: appointment(-2 * DAY), ...price(base) },
    { ...common, street: "66 Tannery Row", postalCode: "97991", yearBuilt: 1944, status: "cancelled", agent: "agent2@gradeline.test", buyer: kai, accessNotes: "Lockbox on the side door.", createdAt: t(-4 * DAY), deadline: t(3 * DAY), visitWindows: windows(1), ...price(base) },
    { ...common, street: "17 Ferrule Court", postalCode: "97991", yearBuilt: 1960, status: "refunded", agent: "agent@gradeline.test", inspector: "inspector2@gradeline.test", buyer: lena, accessNotes: "Owner present.", createdAt: t(-20 * DAY), deadline: t(-10 * DAY), visitWindows: windows(-18), appointment: appointment(-17 * DAY), ...price(base) },
  ];
}
