/**
 * Server adapter: the model a request or a saved kit names — a demo model, a model sent whole, or an imported
 * mesh (read from imported_models, checked against who asks). Routes swap an importId for the model it names
 * (modelSourceInline) before the engine sees the inputs, so every engine path treats an imported mesh as a
 * model; saved kits keep the importId and resolve it again when their files are rebuilt.
 */
import { createHash } from 'node:crypto';
import type { Actor } from '../actor';
import { importedModelKitId, importedModelMesh, importedModelVisible } from '../db/imported-models';
import { ConflictError, InputError } from '../errors';
import type { Model } from '../geometry/model-schema';
import { demoModelResolve } from '../kit/demo-models.server';
import type { ModelSource } from '../kit/kit-inputs';
import { meshDecode } from '../mesh/mesh-binary';
import { meshModelOf } from '../mesh/mesh-model';
import type { MeshShape } from '../mesh/mesh-types';

export interface ResolvedModel {
  /** The demo model's id, "custom", or "import:<id>" (what a saved kit stores as its model_id). */
  id: string;
  title: string;
  model: Model;
}

/** Decoded meshes by digest: the builder asks for the same mesh on every change, decoding it once is enough. */
const decoded = new Map<string, MeshShape['mesh']>();
const DECODED_KEPT = 8;

/** The SHA-256 of stored mesh bytes, as imported_models.mesh_digest keeps it. */
export function meshDigest(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/**
 * The model a source names. `actor` null is the app itself rebuilding a saved kit (the kit's access was
 * checked): its imported model is then read whoever owns it, and 409 when it was deleted.
 */
export async function modelResolve(actor: Actor | null, source: ModelSource): Promise<ResolvedModel> {
  if (source.importId === undefined) return demoModelResolve(source);
  const id = source.importId;
  const stored = actor && !(await importedModelVisible(actor, id)) ? null : await importedModelMesh(id);
  if (!stored) {
    if (!actor) throw new ConflictError('The imported model of this kit was deleted; build a new kit.');
    throw new InputError('There is no imported model with that id among the models you can use.', {
      importId: ['not an imported model you can use'],
    });
  }
  let mesh = decoded.get(stored.mesh_digest);
  if (!mesh) {
    mesh = meshDecode(stored.reduced_mesh ?? stored.mesh);
    decoded.set(stored.mesh_digest, mesh);
    if (decoded.size > DECODED_KEPT) decoded.delete(decoded.keys().next().value!);
  }
  const shape: MeshShape = { digest: stored.mesh_digest, unit: stored.unit, mesh };
  return { id: importedModelKitId(id), title: stored.title, model: meshModelOf(shape, stored.title) };
}

/** The inputs with an importId swapped for the model it names (others unchanged); 400 when the actor may not use it. */
export async function modelSourceInline<T extends ModelSource>(actor: Actor, inputs: T): Promise<T> {
  if (inputs.importId === undefined) return inputs;
  const { model } = await modelResolve(actor, inputs);
  return { ...inputs, importId: undefined, model };
}
