/**
 * Entry point of a sheet render thread (piscina loads it): one job in, one PDF out.
 * Loaded through tsx's loader, like the server itself.
 */
export { runSheetRenderJob as default } from './sheet-render-job';
