// Declarations for modules that ship no types of their own.

/** A font file Metro bundles as an asset: `useFonts` and `Font.loadAsync` take the reference. */
declare module '*.woff2' {
  const asset: number;
  export default asset;
}

/** subset-font 2.9 (harfbuzz's hb-subset in WebAssembly): the options this project uses. */
declare module 'subset-font' {
  type SubsetFontOptions = {
    targetFormat?: 'sfnt' | 'woff' | 'woff2';
    /** OpenType feature tags to keep; every feature when left out. */
    keepFeatures?: string[];
    noHinting?: boolean;
    noLayoutClosure?: boolean;
  };
  function subsetFont(buffer: Buffer, text: string, options?: SubsetFontOptions): Promise<Buffer>;
  export = subsetFont;
}
