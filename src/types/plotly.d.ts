// The part of plotly.js the app calls directly (react-plotly.js/factory does the rest). The
// bundle 'plotly.js-dist-min' ships no types; `plotly.js` is an alias of it (RECIPES.md).
declare module 'plotly.js-dist-min' {
  interface ImageOptions {
    format: 'png' | 'svg' | 'jpeg' | 'webp';
    filename: string;
    width?: number;
    height?: number;
    scale?: number;
  }
  const Plotly: {
    downloadImage(gd: HTMLElement, options: ImageOptions): Promise<string>;
  };
  export default Plotly;
}
