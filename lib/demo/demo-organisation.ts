import type { Role } from '@/lib/auth/roles';

/**
 * The invented demo scenario: Brightwater Orbital, a small satellite
 * builder, designs the orbit of TERNLIGHT-1, a wetland-monitoring imager,
 * for its customer, the Northmere Basin Authority. All names are invented.
 */
export const DEMO_ORGANISATION = 'Brightwater Orbital';
/** What the demo's PDFs print under the title page (seeded as the organisation setting). */
export const DEMO_DISTRIBUTION_STATEMENT =
  'Distribution: Brightwater Orbital and the Northmere Basin Authority only. Do not pass on without written consent.';
export const DEMO_PASSWORD = 'ternlight-demo-26';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'ilse.marrow@brightwater.example', name: 'Ilse Marrow', role: 'analyst' },
  { email: 'tobias.quenby@brightwater.example', name: 'Tobias Quenby', role: 'reviewer' },
  { email: 'ruth.okafor-lind@brightwater.example', name: 'Ruth Okafor-Lind', role: 'config-manager' },
  { email: 'samir.dunmore@northmere-basin.example', name: 'Samir Dunmore', role: 'customer' },
  { email: 'pell.hargreave@brightwater.example', name: 'Pell Hargreave', role: 'admin' },
];
