// Test helper: the invented demo technology and small chips made through the API.
import { DEMO_TECHNOLOGY as MESH_DEMO_TECHNOLOGY } from '@hexloom/mesh';
import type { Chip, TechnologyProfileBody } from './contract-types.js';
import type { Agent } from './sign-in.js';

/** Invented demo figures: 650 um units, n_g 4.2, 0.25 dB per gate, 25 dB extinction, P_pi 22 mW, 1.2 kOhm. */
export const DEMO_TECHNOLOGY: TechnologyProfileBody = { ...MESH_DEMO_TECHNOLOGY, bendLossDb: 0, phaseShifter: { ...MESH_DEMO_TECHNOLOGY.phaseShifter, maxPowerW: 0.08, maxVoltageV: 12 } };

/** Creates a rows x columns chip with I/O on the west and east sides through the API. */
export async function createChip(agent: Agent, teamId: string, name: string, rows = 3, columns = 4): Promise<Chip> {
  const res = await agent.post(`/api/teams/${teamId}/chips`).send({ name, template: { rows, columns }, technology: DEMO_TECHNOLOGY }).expect(201);
  return res.body as Chip;
}
