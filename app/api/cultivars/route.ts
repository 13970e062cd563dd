import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { getUnitSystem } from '@/lib/data/users';
import { handle } from '@/lib/http/handler';
import { cultivarJson } from '@/lib/properties/api-shape';
import { cultivarsCsv } from '@/lib/properties/csv-export';
import { parseInput } from '@/lib/validation/parse';
import { cultivarQuerySchema } from '@/lib/validation/cultivars';

/** Published cultivars: `?commodity=<slug>`, `?q=<text>`, `?format=csv`. Any signed-in role. */
export const GET = handle(async (request) => {
  const actor = await requireActor('properties:read-published');
  const query = parseInput(
    cultivarQuerySchema,
    Object.fromEntries(new URL(request.url).searchParams),
  );
  const cultivars = await listPublishedCultivars(actor, query);
  if (query.format === 'csv') {
    return new NextResponse(cultivarsCsv(cultivars, await getUnitSystem(actor)), {
      headers: {
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': 'attachment; filename="tenderline-properties.csv"',
      },
    });
  }
  return NextResponse.json({ cultivars: cultivars.map(cultivarJson) });
});
