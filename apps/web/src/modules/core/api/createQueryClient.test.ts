// The query client's error handling: a failed change reaches the app's toast with a retry where one can help.
import { describe, expect, it, vi } from 'vitest';
import { ApiRequestError } from './ApiRequestError.js';
import { createQueryClient } from './createQueryClient.js';

const failing = (statusCode: number) => new ApiRequestError({ statusCode, error: 'x', message: `failed with ${statusCode}`, request: 'POST /api/x' });

async function runMutation(client: ReturnType<typeof createQueryClient>, fn: () => Promise<unknown>): Promise<void> {
  await client.getMutationCache().build(client, { mutationFn: fn }).execute(undefined).catch(() => undefined);
}

describe('createQueryClient', () => {
  it('hands a failed change to onMutationError with a retry that runs it again (5xx)', async () => {
    const onMutationError = vi.fn();
    const client = createQueryClient({ retries: 0, onMutationError });
    const fn = vi.fn().mockRejectedValueOnce(failing(503)).mockResolvedValueOnce('ok');
    await runMutation(client, fn);
    expect(onMutationError).toHaveBeenCalledTimes(1);
    const [error, retry] = onMutationError.mock.calls[0]!;
    expect((error as Error).message).toBe('failed with 503');
    (retry as () => void)();
    await vi.waitFor(() => expect(fn).toHaveBeenCalledTimes(2));
  });

  it('offers no retry for a refusal (4xx), and stays silent for 401 and 409, which the pages answer', async () => {
    const onMutationError = vi.fn();
    const onUnauthorized = vi.fn();
    const client = createQueryClient({ retries: 0, onMutationError, onUnauthorized });
    await runMutation(client, () => Promise.reject(failing(422)));
    expect(onMutationError.mock.calls[0]![1]).toBeUndefined();
    await runMutation(client, () => Promise.reject(failing(409)));
    await runMutation(client, () => Promise.reject(failing(401)));
    expect(onMutationError).toHaveBeenCalledTimes(1);
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });
});
