// Query keys of chip and configuration data.

/** Query key builders for a team's chips, one chip and its calibration, configurations, versions and simulations. */
export const chipQueryKeys = {
  chips: (teamId: string) => ['teams', teamId, 'chips'] as const,
  chip: (teamId: string, chipId: string) => ['teams', teamId, 'chips', chipId] as const,
  calibration: (teamId: string, chipId: string) => ['teams', teamId, 'chips', chipId, 'calibration'] as const,
  configurations: (teamId: string, chipId: string) => ['teams', teamId, 'chips', chipId, 'configurations'] as const,
  configuration: (teamId: string, configurationId: string) => ['teams', teamId, 'configurations', configurationId] as const,
  version: (teamId: string, configurationId: string, number: number) => ['teams', teamId, 'configurations', configurationId, 'versions', number] as const,
  simulation: (teamId: string, configurationId: string, number: number, from: string, to: string) => ['teams', teamId, 'configurations', configurationId, 'versions', number, 'simulate', from, to] as const,
};
