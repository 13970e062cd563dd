/** A source row a lab upload cites: one per test, a report ('demo' for a demo upload). */
export interface TestSource {
  key: string;
  kind: 'report' | 'demo';
  authors: string;
  year: number;
  title: string;
  venue: string;
  note: string | null;
}

/** Who uploaded which test, and when: what its source is written from. */
export interface UploadedTestFacts {
  id: number;
  createdAt: string;
  uploaderName: string;
  isDemo: boolean;
}

/**
 * The source a test's draft values cite, keyed `<prefix>-<id>`: "In-house <what> #id, date,
 * uploaded by …"; a demo upload's note says its `invented` data are not a measurement.
 */
export function uploadedTestSource(
  test: UploadedTestFacts,
  name: { prefix: string; what: string; invented: string },
): TestSource {
  const date = test.createdAt.slice(0, 10);
  return {
    key: `${name.prefix}-${test.id}`,
    kind: test.isDemo ? 'demo' : 'report',
    authors: test.uploaderName,
    year: Number(date.slice(0, 4)),
    title: `In-house ${name.what} #${test.id}, ${date}, uploaded by ${test.uploaderName}`,
    venue: 'Tenderline lab-test upload',
    note: test.isDemo ? `Demo upload: invented ${name.invented}, not a measurement.` : null,
  };
}
