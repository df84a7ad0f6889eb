import { USDZExporter } from 'three/examples/jsm/exporters/USDZExporter.js';
import { defaultCatalogue, type Catalogue } from '@/domain/catalogue';
import type { DesignDocument } from '@/domain/design/schema';
import { designToScene } from './gltfExport';

/**
 * The design as USDZ (a zip holding a USD scene) for phones that open it natively in their AR
 * viewer: the same scene as the glTF export (one mesh per profile and panel, metres, Y up, plain
 * untextured materials, so no canvas is needed), anchored on a horizontal plane at true scale.
 */
export async function designToUsdz(design: DesignDocument, catalogue: Catalogue = defaultCatalogue): Promise<Uint8Array> {
  const scene = designToScene(design, catalogue);
  return new USDZExporter().parseAsync(scene, {
    ar: { anchoring: { type: 'plane' }, planeAnchoring: { alignment: 'horizontal' } },
    quickLookCompatible: true,
  });
}

