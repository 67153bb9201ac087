/** Seeds the invented demo designs into the demo team: chip, calibration, three configurations in review states. */
import type { CircuitFigures, ConfigurationFile, VersionStatus } from '@hexloom/contracts';
import { buildMesh, emptyConfiguration } from '@hexloom/mesh';
import { randomStream, savedFigures, simulateTransmission, synthesise } from '@hexloom/synth';
import { and, eq, inArray } from 'drizzle-orm';
import type { Database, DbExecutor } from './database.js';
import { DEMO_TEAM } from './demo-accounts.js';
import { DEMO_CHIP_NAME, DEMO_SPECS, demoCalibration, demoChipDefinition } from './demo-designs.js';
import { calibrations, chips, comments, configurations, configurationVersions, measurements, reviews, teams, users } from './schema/index.js';

/** What the design seed did. */
export type DesignSeedResult = { created: boolean; chipId: string };

type Plan = { author: string; status: VersionStatus; reviewer: string | null };

/** Who wrote each demo configuration and where its review stands. */
const PLANS: readonly Plan[] = [
  { author: 'noor', status: 'approved', reviewer: 'caspar' },
  { author: 'tobin', status: 'in_review', reviewer: 'wen' },
  { author: 'noor', status: 'changes_requested', reviewer: 'caspar' },
];

/**
 * Inserts the demo chip of the demo team with its calibration, the three synthesised configurations
 * (version 1 all parked, version 2 synthesised) in approved / in review / changes requested states,
 * a comment thread, and one synthetic "measured" spectrum (the model plus seeded noise, labelled so).
 * Does nothing when the demo chip already exists; needs the demo team and accounts (seedDemo) first.
 */
export async function seedDemoDesigns(db: Database): Promise<DesignSeedResult> {
  const [team] = await db.select().from(teams).where(eq(teams.slug, DEMO_TEAM.slug));
  if (!team) throw new Error(`seedDemoDesigns: team "${DEMO_TEAM.slug}" is not seeded`);
  const [existing] = await db.select({ id: chips.id }).from(chips).where(and(eq(chips.teamId, team.id), eq(chips.name, DEMO_CHIP_NAME)));
  if (existing) return { created: false, chipId: existing.id };
  const people = await db.select({ id: users.id, login: users.login }).from(users).where(inArray(users.login, ['ilse', 'noor', 'tobin', 'caspar', 'wen']));
  const idOf = (login: string): string => {
    const person = people.find((p) => p.login === login);
    if (!person) throw new Error(`seedDemoDesigns: demo account "${login}" is missing`);
    return person.id;
  };
  const definition = demoChipDefinition();
  const mesh = buildMesh(definition);
  const empty = emptyConfiguration(definition, 'bar') as ConfigurationFile;
  const designs = DEMO_SPECS.map((d) => {
    const result = synthesise({ spec: d.spec, mesh, configuration: empty, circuitId: d.circuitId });
    if (!result.ok) throw new Error(`seedDemoDesigns: "${d.spec.name}" could not be synthesised: ${result.message}`);
    // A demo that misses its own spec would teach the wrong thing: refuse to seed it.
    if (!result.verdict.pass) throw new Error(`seedDemoDesigns: "${d.spec.name}" misses ${result.verdict.failed.length} of its checks: ${result.verdict.failed.map((c) => `${c.quantity} at ${c.toName} (${c.measured.toPrecision(4)} ${c.unit}, limit ${c.limit.toPrecision(4)})`).join('; ')}`);
    const figures: CircuitFigures = { [d.circuitId]: savedFigures(result.verification, result.verdict) };
    return { ...d, content: result.configuration as ConfigurationFile, figures };
  });
  return db.transaction(async (tx) => {
    const [chip] = await tx.insert(chips).values({ teamId: team.id, name: DEMO_CHIP_NAME, definition, createdBy: idOf('ilse') }).returning();
    if (!chip) throw new Error('seedDemoDesigns: chip insert returned no row');
    await tx.insert(calibrations).values({ chipId: chip.id, fileName: 'demo-calibration.csv', shifters: demoCalibration(definition), uploadedBy: idOf('ilse') });
    for (const [k, design] of designs.entries()) {
      const plan = PLANS[k] as Plan;
      const versionId = await insertConfiguration(tx, { teamId: team.id, chipId: chip.id, name: design.configuration, authorId: idOf(plan.author), content: design.content, empty, design, plan, idOf });
      if (design.circuitId === 'notch') await insertNotchExtras(tx, versionId, design.content, idOf);
      if (design.circuitId === 'bandpass') {
        const [first] = await tx
          .insert(comments)
          .values({ versionId, authorId: idOf('caspar'), body: 'Pass-band ripple is close to the 1.5 dB limit; can the outer couplers take a little more margin?', anchor: { fromHz: 1.8e9, toHz: 2.2e9 } })
          .returning();
        await tx.insert(comments).values({ versionId, parentId: first?.id ?? null, authorId: idOf('noor'), body: '@caspar I will retune the first coupler and save a new version.' });
      }
    }
    return { created: true, chipId: chip.id };
  });
}

type ConfigurationSeed = {
  teamId: string; chipId: string; name: string; authorId: string; content: ConfigurationFile; empty: ConfigurationFile;
  design: { circuitId: string; spec: (typeof DEMO_SPECS)[number]['spec']; figures: CircuitFigures }; plan: Plan; idOf: (login: string) => string;
};

async function insertConfiguration(tx: DbExecutor, s: ConfigurationSeed): Promise<string> {
  const [row] = await tx.insert(configurations).values({ teamId: s.teamId, chipId: s.chipId, name: s.name, headVersion: 2, createdBy: s.authorId }).returning();
  if (!row) throw new Error('seedDemoDesigns: configuration insert returned no row');
  await tx.insert(configurationVersions).values({ configurationId: row.id, number: 1, content: s.empty, note: 'every gate parked', authorId: s.authorId });
  const approved = s.plan.status === 'approved';
  const [version] = await tx
    .insert(configurationVersions)
    .values({
      configurationId: row.id, number: 2, content: s.content, specs: [{ circuitId: s.design.circuitId, spec: s.design.spec }], figures: s.design.figures,
      note: `synthesised: ${s.design.spec.name}`, status: s.plan.status, authorId: s.authorId,
      approvedBy: approved && s.plan.reviewer ? s.idOf(s.plan.reviewer) : null, approvedAt: approved ? new Date() : null,
    })
    .returning();
  if (!version) throw new Error('seedDemoDesigns: version insert returned no row');
  if (s.plan.reviewer) {
    const decision = s.plan.status === 'approved' ? 'approve' : s.plan.status === 'changes_requested' ? 'request_changes' : null;
    await tx.insert(reviews).values({
      versionId: version.id, reviewerId: s.idOf(s.plan.reviewer), requestedBy: s.authorId, decision,
      note: decision === 'approve' ? 'Delays within 5 ps of the plan; approved for the bench.' : decision ? 'See my comment on the pass band.' : '', decidedAt: decision ? new Date() : null,
    });
  }
  return version.id;
}

/** A comment anchored to a gate and a synthetic "measured" spectrum: the model plus seeded 0.15 dB noise. */
async function insertNotchExtras(tx: DbExecutor, versionId: string, content: ConfigurationFile, idOf: (login: string) => string): Promise<void> {
  const mesh = buildMesh(content.mesh);
  const ring = content.circuits[0]?.couplers[0]?.gate;
  if (ring) await tx.insert(comments).values({ versionId, authorId: idOf('wen'), body: 'Is this coupler the one we measured as weak on the last wafer?', anchor: { gate: ring } });
  const port = (label: string): string => mesh.ports[mesh.portIndex.get(label) ?? -1]?.id ?? label;
  const [from, to] = [port('W03'), port('E03')];
  const offsets = Array.from({ length: 121 }, (_, i) => 2e9 + (2e9 * i) / 120);
  const model = simulateTransmission({ mesh, configuration: content, from, to, offsetsHz: offsets });
  const random = randomStream(7_031, 0);
  const f0 = content.mesh.technology.referenceFrequencyHz;
  const powerDb = model.powerDb.map((p) => p + 0.15 * random.normal());
  const frequencyHz = offsets.map((f) => f0 + f);
  const text = ['# SYNTHETIC measurement (demo): generated from the model with seeded 0.15 dB noise, not bench data', 'frequency_hz,amplitude_db', ...frequencyHz.map((f, i) => `${f},${(powerDb[i] ?? 0).toFixed(4)}`)].join('\n');
  await tx.insert(measurements).values({
    versionId, fileName: 'notch-sweep-synthetic.csv', format: 'csv', sizeBytes: new TextEncoder().encode(text).length, fromPort: from, toPort: to,
    label: 'synthetic: model + noise (demo)', text, points: { frequencyHz, powerDb }, uploadedBy: idOf('tobin'),
  });
}
