import { AppError, ValidationError } from '@/lib/errors';
import { MAX_PHOTO_BYTES, MIB } from './limits';

/** 415: the bytes are not a JPEG, PNG or WebP image, whatever the name or declared type says. */
export class PhotoTypeError extends AppError {
  constructor(message: string) {
    super(415, 'unsupported_media_type', message);
  }
}

/** 413: the photo itself is over the limit (the request's size is checked by the handler). */
export class PhotoTooLargeError extends AppError {
  constructor() {
    super(413, 'too_large', `The photo is larger than ${MAX_PHOTO_BYTES / MIB} MB.`);
  }
}

/** A 400 aimed at the form's file field. */
export function fileError(message: string): ValidationError {
  return new ValidationError(message, { file: [message] });
}
