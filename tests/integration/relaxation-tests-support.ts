// First: upload-calls brings the session stand-in, which must be in place before the routes load.
import { uploadCalls } from './upload-calls';
import * as uploads from '@/app/api/cultivars/[slug]/relaxation-tests/route';
import * as draft from '@/app/api/relaxation-tests/[id]/draft/route';

export { as, ids, ORIGIN, params, prepareUploadTests, SLUG, type Who } from './upload-calls';

export const FIELDS = { deformationMm: '5', specimen: 'whole fruit between flat plates' };

/** The relaxation routes' calls: a file is sent as relax.csv with FIELDS unless told otherwise. */
export const { upload, startDraft, storedState } = uploadCalls({
  upload: uploads.POST,
  draft: draft.POST,
  table: 'relaxation_tests',
  fields: FIELDS,
  fileName: 'relax.csv',
});
