// A glTF model made from one of Parlour's own drawn forms, with the glTF library: the demo studio's
// piece models are generated this way (nothing is taken from anywhere). The form's main and accent
// parts become materials named "main" and "accent" (so a piece may dress them in its finishes); its
// own-coloured parts (a mirror's glass, a plant's leaves) keep their colours as vertex colours.
import { Document, type Material } from '@gltf-transform/core';
import { buildPieceForms } from '../../../shared/geometry/forms/piece-forms';
import type { MeshData } from '../../../shared/geometry/scene';
import type { Piece } from '../../../shared/schemas/option';

const srgbToLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
function linearColour(hex: string): [number, number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [srgbToLinear(((n >> 16) & 255) / 255), srgbToLinear(((n >> 8) & 255) / 255), srgbToLinear((n & 255) / 255), 1];
}

/** The model of `piece`'s form, standing on y = 0, centred, its front facing +Z (glTF metres, Y up). */
export function formModelDocument(piece: Piece, colours: { main: string; accent: string }): Document {
  const [form] = buildPieceForms([{ ...piece, x: 0, y: 0, rotation: 0, elevation: 0, placed: true }]);
  if (!form) throw new Error(`no form for ${piece.kind ?? 'plain-block'}`);
  const doc = new Document();
  const buffer = doc.createBuffer();
  const mesh = doc.createMesh(piece.name);
  const add = (data: MeshData, material: Material, vertexColours?: Float32Array) => {
    if (data.indices.length === 0) return;
    const prim = doc
      .createPrimitive()
      .setMaterial(material)
      .setAttribute('POSITION', doc.createAccessor().setType('VEC3').setArray(data.positions.slice()).setBuffer(buffer))
      .setAttribute('NORMAL', doc.createAccessor().setType('VEC3').setArray(data.normals.slice()).setBuffer(buffer))
      .setAttribute('TEXCOORD_0', doc.createAccessor().setType('VEC2').setArray(data.uvs.slice()).setBuffer(buffer))
      .setIndices(doc.createAccessor().setType('SCALAR').setArray(data.indices.slice()).setBuffer(buffer));
    if (vertexColours)
      prim.setAttribute('COLOR_0', doc.createAccessor().setType('VEC3').setArray(vertexColours).setBuffer(buffer));
    mesh.addPrimitive(prim);
  };
  add(
    form.meshes.main,
    doc.createMaterial('main').setBaseColorFactor(linearColour(colours.main)).setRoughnessFactor(0.85).setMetallicFactor(0),
  );
  add(
    form.meshes.accent,
    doc.createMaterial('accent').setBaseColorFactor(linearColour(colours.accent)).setRoughnessFactor(0.6).setMetallicFactor(0),
  );
  const own = new Float32Array(form.meshes.own.positions.length);
  let at = 0;
  for (const run of form.meshes.ownColours) {
    const c = linearColour(run.colour);
    for (let v = 0; v < run.vertexCount; v++, at += 3) own.set(c.slice(0, 3), at);
  }
  add(form.meshes.own, doc.createMaterial('own').setRoughnessFactor(0.7).setMetallicFactor(0), own);
  doc.createScene(piece.name).addChild(doc.createNode(piece.name).setMesh(mesh));
  return doc;
}
