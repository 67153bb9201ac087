// Invented demo data for the web tests (no real people or labs).
import type { Me, Member } from '@hexloom/contracts';

export const DEMO_TEAM_ID = '5b0c3a52-8d0e-4c61-9a7e-1f2d3c4b5a69';

const USER_IDS = {
  ilse: '0f6a1c2e-1111-4a8b-9c3d-2e4f6a8b0c1d',
  noor: '0f6a1c2e-2222-4a8b-9c3d-2e4f6a8b0c1d',
  dario: '0f6a1c2e-3333-4a8b-9c3d-2e4f6a8b0c1d',
} as const;

/** Three members of the invented Kestrel Vale team. */
export const demoMembers: Member[] = [
  { userId: USER_IDS.ilse, login: 'ilse', name: 'Ilse Marrow', email: 'ilse@kestrel-vale.example', role: 'owner', joinedAt: '2026-01-05T09:00:00.000Z' },
  { userId: USER_IDS.noor, login: 'noor', name: 'Noor Halvorsen', email: 'noor@kestrel-vale.example', role: 'designer', joinedAt: '2026-02-11T10:30:00.000Z' },
  { userId: USER_IDS.dario, login: 'dario', name: 'Dario Fennimore', email: null, role: 'viewer', joinedAt: '2026-03-20T14:15:00.000Z' },
];

/** GET /api/me for `login`, who holds `role` in the demo team. */
export function demoMe(login: 'ilse' | 'noor' | 'dario', role: Member['role']): Me {
  const member = demoMembers.find((m) => m.login === login);
  return {
    user: { id: member?.userId ?? USER_IDS.ilse, login, name: member?.name ?? login, email: member?.email ?? null, avatarUrl: null },
    teams: [{ id: DEMO_TEAM_ID, slug: 'kestrel-vale', name: 'Kestrel Vale RF Photonics', role }],
  };
}
