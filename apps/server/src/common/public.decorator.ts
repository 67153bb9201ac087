/** Marks a route as reachable without a session. */
import { SetMetadata } from '@nestjs/common';

/** Metadata key read by the session guard. */
export const IS_PUBLIC = 'hexloom:isPublic';

/** Skips the session requirement for this route or controller. */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC, true);
