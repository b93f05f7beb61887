import { useRef, type RefObject } from 'react';
import type { Group } from 'three';
import type { EditorModel } from '../model/editor-model';
import { MAX_DESIGN_FILE_BYTES, designFromJson, designToJson, downloadBlob, fileNameFor } from '../io/design-file';
import { exportGlb } from '../io/gltf-export';
import { EditorIcon } from './editor-icons';
import { PanelButton } from './panel-bits';

/** Import and export of the design file, and glTF export of the 3D model. */
export function FileMenu({ model, modelGroup, readOnly }: { model: EditorModel; modelGroup: RefObject<Group | null>; readOnly: boolean }) {
  const fileRef = useRef<HTMLInputElement>(null);
  const design = model.getSnapshot().design;
  return (
    <>
      {!readOnly ? (
        <>
          <PanelButton onClick={() => fileRef.current?.click()} title="Replace the design with a .json design file (undo brings yours back)">
            <EditorIcon name="upload" className="h-4 w-4" /> Import
          </PanelButton>
          <input
            ref={fileRef}
            type="file"
            accept="application/json,.json"
            className="hidden"
            aria-label="Design file to import"
            onChange={async (e) => {
              const file = e.target.files?.[0];
              e.target.value = '';
              if (!file) return;
              if (file.size > MAX_DESIGN_FILE_BYTES) {
                model.apply(() => ({ ok: false, error: 'That file is too large for a spool design (over 5 MB)' }));
                return;
              }
              const read = designFromJson(await file.text());
              if (!read.ok) model.apply(() => ({ ok: false, error: read.message }));
              else model.apply(() => ({ ok: true, design: read.design, label: `Import ${file.name}` }));
            }}
          />
        </>
      ) : null}
      <PanelButton disabled={!design} onClick={() => design && downloadBlob(designToJson(design), 'application/json', fileNameFor(design.mark, 'json'))} title="Download as .json">
        <EditorIcon name="download" className="h-4 w-4" /> Design file
      </PanelButton>
      <PanelButton
        disabled={!design}
        title="Download the 3D model (.glb)"
        onClick={async () => {
          if (!modelGroup.current || !design) return;
          try {
            const glb = await exportGlb(modelGroup.current);
            downloadBlob(glb, 'model/gltf-binary', fileNameFor(design.mark, 'glb'));
          } catch (cause) {
            model.apply(() => ({ ok: false, error: `glTF export failed: ${cause instanceof Error ? cause.message : 'unknown error'}` }));
          }
        }}
      >
        <EditorIcon name="cube" className="h-4 w-4" /> glTF
      </PanelButton>
    </>
  );
}
