import { describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { cameraJpeg, claimedHugePng, compressibleHugePng, jpegWithComment } from './photos-files';
import {
  jpeg,
  multipart,
  post,
  stored,
  UPLOAD_URL,
  uploadAs,
  setUpPhotoTests,
  type Who,
} from './photos-setup';

setUpPhotoTests();

const MiB = 1024 * 1024;
const text = (s: string) => Buffer.from(s, 'utf8');
const PAGE = '<!doctype html><html><body><script>fetch("/api/me")</script></body></html>';

interface Refusal {
  name: string;
  request: () => Promise<{ status: number; body: { message: string; fieldErrors?: object } }>;
  status: number;
  message: RegExp;
}

const as = (who: Who) => async () => uploadAs(who, { file: jpeg(await cameraJpeg(64, 48)) });

const REFUSALS: Refusal[] = [
  {
    name: 'a text file renamed .jpg',
    request: async () => uploadAs('editor', { file: jpeg(text('Row 4: Jonathan, 12 bins\n')) }),
    status: 415,
    message: /not a JPEG, PNG or WebP image: its contents are not an image/,
  },
  {
    name: 'a web page renamed .png and declared image/png',
    request: async () =>
      uploadAs('editor', { file: { bytes: text(PAGE), name: 'x.png', type: 'image/png' } }),
    status: 415,
    message: /not a JPEG, PNG or WebP image/,
  },
  {
    name: 'a GIF renamed .jpg',
    request: async () =>
      uploadAs('editor', {
        file: jpeg(
          await sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } })
            .gif()
            .toBuffer(),
        ),
      }),
    status: 415,
    message: /contents are image\/gif, not a JPEG, PNG or WebP image/,
  },
  {
    name: 'a polyglot: a valid JPEG with a web page appended',
    request: async () =>
      uploadAs('editor', { file: jpeg(Buffer.concat([await cameraJpeg(64, 48), text(PAGE)])) }),
    status: 400,
    message: new RegExp(`carries ${PAGE.length} bytes after the end of the JPEG image`),
  },
  {
    name: 'a polyglot: a JPEG whose comment segment holds a script',
    request: async () =>
      uploadAs('editor', { file: jpeg(jpegWithComment(await cameraJpeg(64, 48), PAGE)) }),
    status: 400,
    message: /web-page or script markup \(<script…\)/,
  },
  {
    name: 'a polyglot: a PNG with a web page after its end chunk',
    request: async () => {
      const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#0a0' } })
        .png()
        .toBuffer();
      return uploadAs('editor', { file: jpeg(Buffer.concat([png, text(PAGE)]), 'leaf.png') });
    },
    status: 400,
    message: /bytes after the end of the PNG image/,
  },
  {
    name: 'a JPEG cut short',
    request: async () => {
      const whole = await cameraJpeg(640, 480);
      return uploadAs('editor', { file: jpeg(whole.subarray(0, whole.length >> 1)) });
    },
    status: 400,
    message: /JPEG image is damaged or cut short/,
  },
  {
    name: 'a bomb: a 200-byte PNG whose header claims 100 000 × 100 000 px',
    request: async () =>
      uploadAs('editor', { file: jpeg(claimedHugePng(100_000, 100_000), 'b.png') }),
    status: 400,
    message: /100000 × 100000 px \(10,000 megapixels\); the limit is 40 megapixels/,
  },
  {
    name: 'a bomb: a real 7000 × 6000 px one-colour PNG of about 50 KB',
    request: async () =>
      uploadAs('editor', { file: jpeg(await compressibleHugePng(7000, 6000), 'grey.png') }),
    status: 400,
    message: /7000 × 6000 px \(42 megapixels\); the limit is 40 megapixels/,
  },
  {
    name: 'a file of 8 MB and one byte (the request itself within the envelope allowance)',
    request: async () => uploadAs('editor', { file: jpeg(Buffer.alloc(8 * MiB + 1, 0xff)) }),
    status: 413,
    message: /The photo is larger than 8 MB/,
  },
  {
    name: 'a 9 MB body sent without a Content-Length (stopped while reading)',
    request: async () => uploadAs('editor', { file: jpeg(Buffer.alloc(9 * MiB, 0xff)) }),
    status: 413,
    message: /larger than 8256 KB/,
  },
  {
    name: 'a path-like file name',
    request: async () =>
      uploadAs('editor', { file: jpeg(await cameraJpeg(64, 48), '../../etc/passwd.jpg') }),
    status: 400,
    message: /file name looks like a path/,
  },
  {
    name: 'a Windows path-like file name',
    request: async () =>
      uploadAs('editor', { file: jpeg(await cameraJpeg(64, 48), '..\\..\\boot.jpg') }),
    status: 400,
    message: /file name looks like a path/,
  },
  {
    name: 'no file at all',
    request: async () => uploadAs('editor', { caption: 'Forgot the file' }),
    status: 400,
    message: /Choose a photo to upload/,
  },
  {
    name: 'a caption of 301 characters',
    request: async () =>
      uploadAs('editor', { file: jpeg(await cameraJpeg(64, 48)), caption: 'c'.repeat(301) }),
    status: 400,
    message: /Some fields are not valid/,
  },
  {
    name: 'an upload claiming to be a demo photo',
    request: async () => uploadAs('editor', { file: jpeg(await cameraJpeg(64, 48)), demo: 'true' }),
    status: 400,
    message: /Some fields are not valid/,
  },
  {
    name: 'a JSON body instead of multipart',
    request: async () =>
      post(
        new Request(UPLOAD_URL, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: '{"file":"x"}',
        }),
      ),
    status: 415,
    message: /Send the request body as multipart\/form-data/,
  },
  {
    name: 'a foreign Origin',
    request: async () =>
      uploadAs(
        'editor',
        { file: jpeg(await cameraJpeg(64, 48)) },
        { origin: 'https://orchard-offers.example' },
      ),
    status: 403,
    message: /writes are accepted only from Tenderline's own pages/,
  },
  { name: 'an engineer', request: as('engineer'), status: 403, message: /engineer role may not/ },
  { name: 'a buyer', request: as('buyer'), status: 403, message: /buyer role may not/ },
  { name: 'a signed-out visitor', request: as('signed-out'), status: 401, message: /Sign in/ },
];

describe('refused uploads store nothing', () => {
  for (const refusal of REFUSALS) {
    it(`${refusal.name} → ${refusal.status}`, async () => {
      const before = await stored();
      const { status, body } = await refusal.request();
      expect(status).toBe(refusal.status);
      expect(body.message).toMatch(refusal.message);
      expect(await stored()).toEqual(before);
    });
  }

  it('field messages name the field that is wrong', async () => {
    const file = jpeg(await cameraJpeg(64, 48));
    const long = await uploadAs('editor', {
      file,
      caption: 'c'.repeat(301),
      credit: 'k'.repeat(201),
    });
    expect(long.body.fieldErrors).toEqual({
      caption: ['The caption is at most 300 characters.'],
      credit: ['The credit is at most 200 characters.'],
    });
    const demo = await uploadAs('editor', { file, demo: 'true' });
    expect(demo.body.fieldErrors).toEqual({
      demo: ['Only the demo seed marks a photo as a demo photo.'],
    });
    const path = await uploadAs('editor', { file: { ...file, name: '../../etc/passwd.jpg' } });
    expect(Object.keys(path.body.fieldErrors)).toEqual(['file']);
  });

  it('a Content-Length over the limit is refused before a byte of the body is read', async () => {
    const before = await stored();
    let pulled = false;
    const body = new ReadableStream({ pull: () => void (pulled = true) }, { highWaterMark: 0 });
    const request = new Request(UPLOAD_URL, {
      method: 'POST',
      body,
      duplex: 'half',
      headers: {
        'content-type': 'multipart/form-data; boundary=x',
        'content-length': String(8 * MiB + 64 * 1024 + 1),
      },
    } as RequestInit);
    const { status, body: answer } = await post(request);
    expect(status).toBe(413);
    expect(answer.message).toMatch(/larger than 8256 KB/);
    expect(pulled).toBe(false);
    expect(await stored()).toEqual(before);
  });

  it('an unknown cultivar is a 404', async () => {
    const request = multipart(UPLOAD_URL, { file: jpeg(await cameraJpeg(64, 48)) });
    const { status } = await post(request, 'editor', 'no-such-cultivar');
    expect(status).toBe(404);
  });
});
