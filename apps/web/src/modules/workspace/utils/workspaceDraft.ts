// The editable state of the configuration workspace: what a save would send.
import type { CircuitFigures, CircuitSpec, ConfigurationFile } from '@hexloom/contracts';

/** Content, specs and the figures last computed for them (the server recomputes figures on save). */
export type WorkspaceDraft = { content: ConfigurationFile; specs: CircuitSpec[]; figures: CircuitFigures };
