/** Placeholder until the photo feature lands: the cultivar page renders this slot. */
export function CultivarPhotos(_props: { slug: string; canUpload: boolean }) {
  return null;
}
