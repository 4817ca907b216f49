export { makeBundles } from './make-bundles';
export type { CutLay, MakeBundlesInput, Bundle } from './make-bundles';
