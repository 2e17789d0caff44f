/** A photo the author may put into a story: the collection's own, with the alt text it already has. */
export interface RichTextMediaChoice {
  id: number;
  caption: string;
  altText: string;
  thumbUrl?: string | null;
}

/** The photos on offer, or a loader that fetches them when the author opens the photo dialog. */
export type RichTextMediaSource = RichTextMediaChoice[] | (() => Promise<RichTextMediaChoice[]>);
