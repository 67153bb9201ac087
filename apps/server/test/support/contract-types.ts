// Test helper: contract types the API specs read answers as.
import type { z } from 'zod';
import type { technologyProfileSchema } from '@hexloom/contracts';

export type { Chip, ConfigurationDetail, ConfigurationVersion, Proposal } from '@hexloom/contracts';
export type TechnologyProfileBody = z.input<typeof technologyProfileSchema>;
