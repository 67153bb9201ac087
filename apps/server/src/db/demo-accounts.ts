/** The invented demo team and its accounts, shared by the seed and the local sign-in page. */
import type { TeamRole } from '@hexloom/contracts';

/** One demo account: login, display name, role in the demo team. */
export type DemoAccount = { login: string; name: string; role: TeamRole; email: string };

/** Slug and name of the invented demo team. */
export const DEMO_TEAM = { slug: 'kestrel-vale', name: 'Kestrel Vale RF Photonics' } as const;

const demo = (login: string, name: string, role: TeamRole): DemoAccount => ({
  login,
  name,
  role,
  email: `${login}@kestrel-vale.example`,
});

/** The demo accounts, owners first. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  demo('ilse', 'Ilse Marrow', 'owner'),
  demo('oskar', 'Oskar Penhaligon', 'owner'),
  demo('noor', 'Noor Halvorsen', 'designer'),
  demo('tobin', 'Tobin Achterberg', 'designer'),
  demo('caspar', 'Caspar Iyengar', 'reviewer'),
  demo('wen', 'Wen Lathrop', 'reviewer'),
  demo('dario', 'Dario Fennimore', 'viewer'),
  demo('maelle', 'Maelle Quist', 'viewer'),
];
