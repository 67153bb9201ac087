// Type-level guard: every file schema parses into a value the mesh library accepts, so the two cannot drift.
import { describe, expect, expectTypeOf, it } from 'vitest';
import type { z } from 'zod';
import type { Circuit, Configuration, GateSetting, MeshDefinition, MeshShape, PathStep, RouteRequest, TechnologyProfile } from '../../../mesh/src/index.js';
import { circuitSchema, configurationSchema, gateSettingSchema, meshDefinitionSchema, meshShapeSchema, pathStepSchema, routeRequestSchema, technologyProfileSchema } from './index.js';

describe('mesh file schemas', () => {
  it('infer types assignable to the mesh library types', () => {
    expectTypeOf<z.infer<typeof meshDefinitionSchema>>().toExtend<MeshDefinition>();
    expectTypeOf<z.infer<typeof meshShapeSchema>>().toExtend<MeshShape>();
    expectTypeOf<z.infer<typeof technologyProfileSchema>>().toExtend<TechnologyProfile>();
    expectTypeOf<z.infer<typeof configurationSchema>>().toExtend<Configuration>();
    expectTypeOf<z.infer<typeof gateSettingSchema>>().toExtend<GateSetting>();
    expectTypeOf<z.infer<typeof circuitSchema>>().toExtend<Circuit>();
    expectTypeOf<z.infer<typeof pathStepSchema>>().toExtend<PathStep>();
    expectTypeOf<z.infer<typeof routeRequestSchema>>().toExtend<RouteRequest>();
  });
  it('rejects a gate id with an unknown direction and names the field', () => {
    const bad = pathStepSchema.safeParse({ gate: 'g(0,0)sw', in: 'a0', out: 'a1' });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(['gate']);
  });
  it('rejects a mesh definition of another schema version', () => {
    const shape = { kind: 'hexagon', radius: 1 };
    expect(meshShapeSchema.safeParse(shape).success).toBe(true);
    const def = { schemaVersion: 2, name: 'x', shape, ioSites: [], ports: [], deadGates: [] };
    expect(meshDefinitionSchema.safeParse(def).success).toBe(false);
  });
});
