import type { Object3D } from 'three';

/**
 * The model as binary glTF (.glb), in metres with z up as in the scene (glTF viewers
 * expect y up; the root is turned so plant "up" stays up there). The exporter is loaded
 * on demand: most sessions never export.
 */
export async function exportGlb(model: Object3D): Promise<ArrayBuffer> {
  const { GLTFExporter } = await import('three/examples/jsm/exporters/GLTFExporter.js');
  const root = model.clone(true);
  // Scene: z up. glTF: y up. Rotate −90° about x so plant up → glTF +y, plant north → glTF −z.
  root.rotation.x = -Math.PI / 2;
  root.updateMatrixWorld(true);
  const exporter = new GLTFExporter();
  const out = await exporter.parseAsync(root, { binary: true, onlyVisible: true });
  if (!(out instanceof ArrayBuffer)) throw new Error('The glTF exporter returned JSON instead of binary');
  return out;
}
