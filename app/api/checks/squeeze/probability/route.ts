import { requireActor } from '@/lib/auth/session';
import { streamSqueezeProbability } from '@/lib/checks/squeeze/probability';
import { handle, readJson } from '@/lib/http/handler';

/**
 * P(bruise margin < 1) at the grip point from the published spreads: the squeeze inputs plus
 * `samples` (default 1000) and `seed`; answers NDJSON, `{progress}` lines then `{result}`.
 */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  const stream = await streamSqueezeProbability(actor, await readJson(request), request.signal);
  return new Response(stream, {
    headers: { 'Content-Type': 'application/x-ndjson; charset=utf-8' },
  });
});
