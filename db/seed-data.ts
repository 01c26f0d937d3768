/**
 * The invented demo world (domain brief, section 6). Every name, address and number here is made up;
 * e-mail domains are `.example`. The README lists these sign-ins.
 */
import type { Role } from '../shared/schemas/auth';

export const DEMO_PASSWORD = 'Bundlesmith-demo-1';

export const demoOrganizations = [
  { name: 'Alder Creek Thermal Works', kind: 'fabricator' },
  { name: 'Pellmar Compression', kind: 'customer' },
  { name: 'Quarry Hill Hydraulics', kind: 'customer' },
  { name: 'Osprey Vale Renewables', kind: 'customer' },
] as const;

export const demoUsers: { email: string; name: string; role: Role; organization: string }[] = [
  { email: 'customer@pellmar.example', name: 'Ines Varga', role: 'customer', organization: 'Pellmar Compression' },
  { email: 'buyer@quarryhill.example', name: 'Tomas Reyes', role: 'customer', organization: 'Quarry Hill Hydraulics' },
  { email: 'process@ospreyvale.example', name: 'Maren Holt', role: 'customer', organization: 'Osprey Vale Renewables' },
  { email: 'sales@aldercreek.example', name: 'Dana Whitlock', role: 'sales', organization: 'Alder Creek Thermal Works' },
  { email: 'shop@aldercreek.example', name: 'Ruben Okafor', role: 'shop', organization: 'Alder Creek Thermal Works' },
  { email: 'admin@aldercreek.example', name: 'Priya Lindqvist', role: 'admin', organization: 'Alder Creek Thermal Works' },
];
