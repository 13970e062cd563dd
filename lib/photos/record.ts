// A stored photo as pages and the API see it. Declared in lib/photos, below lib/data which reads
// it from the database, so lib/photos/shape.ts can use it without importing lib/data.
export interface PhotoRecord {
  id: number;
  caption: string | null;
  credit: string | null;
  isDemo: boolean;
  /** Pixel size of the uploaded image as seen (after its orientation). */
  width: number;
  height: number;
  bytes: number;
  originalType: string;
  createdAt: string;
}
