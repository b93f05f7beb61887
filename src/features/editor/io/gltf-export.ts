import { Color, Group, InstancedMesh, Matrix4, Mesh, MeshStandardMaterial, type Material, type Object3D } from 'three';

/**
 * Plain meshes in place of instanced ones, so every glTF viewer shows every pipe, weld and
 * marker (instancing needs a glTF extension some viewers lack). Works on a clone.
 */
function expandInstances(root: Object3D): void {
  const instanced: InstancedMesh[] = [];
  root.traverse((o) => {
    if ((o as InstancedMesh).isInstancedMesh) instanced.push(o as InstancedMesh);
  });
  const matrix = new Matrix4();
  const colour = new Color();
  for (const im of instanced) {
    const group = new Group();
    group.name = im.name;
    group.matrix.copy(im.matrix);
    group.matrixAutoUpdate = false;
    const base = im.material as Material;
    for (let i = 0; i < im.count; i++) {
      im.getMatrixAt(i, matrix);
      let material: Material = base;
      if (im.instanceColor) {
        im.getColorAt(i, colour);
        const m = (base as MeshStandardMaterial).clone();
        if ('color' in m) (m as MeshStandardMaterial).color.copy(colour);
        material = m;
      }
      const mesh = new Mesh(im.geometry, material);
      mesh.applyMatrix4(matrix);
      group.add(mesh);
    }
    im.parent?.add(group);
    im.removeFromParent();
  }
}

/**
 * The model as binary glTF (.glb), in metres. The scene is z up and glTF is y up, so the
 * root is turned −90° about x: plant up → glTF +y, plant north → glTF −z. The exporter
 * is loaded on demand: most sessions never export.
 */
export async function exportGlb(model: Object3D): Promise<ArrayBuffer> {
  const { GLTFExporter } = await import('three/examples/jsm/exporters/GLTFExporter.js');
  const root = model.clone(true);
  expandInstances(root);
  root.rotation.x = -Math.PI / 2;
  root.updateMatrixWorld(true);
  const exporter = new GLTFExporter();
  const out = await exporter.parseAsync(root, { binary: true, onlyVisible: true });
  if (!(out instanceof ArrayBuffer)) throw new Error('The glTF exporter returned JSON instead of binary');
  return out;
}
