/**
 * Checks a schema-valid design for what zod cannot see: ids unique across the whole document,
 * references that point at existing parts, and catalogue ids that exist.
 */
import type { Catalogue } from '../catalogue/types';
import type { DesignDocument } from './schema';

export interface DocumentError {
  path: string;
  message: string;
}

/** Every id in the document with the path it sits at (parts, machining, cutouts, steps, ...). */
export function collectIds(design: DesignDocument): { id: string; path: string }[] {
  const out: { id: string; path: string }[] = [];
  design.profiles.forEach((p, i) => {
    out.push({ id: p.id, path: `profiles.${i}.id` });
    p.machining.forEach((m, j) => out.push({ id: m.id, path: `profiles.${i}.machining.${j}.id` }));
  });
  design.joints.forEach((j, i) => out.push({ id: j.id, path: `joints.${i}.id` }));
  design.panels.forEach((p, i) => {
    out.push({ id: p.id, path: `panels.${i}.id` });
    p.cutouts.forEach((c, j) => out.push({ id: c.id, path: `panels.${i}.cutouts.${j}.id` }));
  });
  design.accessories.forEach((a, i) => out.push({ id: a.id, path: `accessories.${i}.id` }));
  design.subAssemblies.forEach((s, i) => out.push({ id: s.id, path: `subAssemblies.${i}.id` }));
  design.steps.forEach((s, i) => out.push({ id: s.id, path: `steps.${i}.id` }));
  design.loadCases.forEach((l, i) => out.push({ id: l.id, path: `loadCases.${i}.id` }));
  return out;
}

/**
 * Calls `visit` for every id in the order collectIds lists them; the path is built only when
 * asked for (a 2,000-part design has ~10,000 ids and usually no duplicate).
 */
function forEachId(design: DesignDocument, visit: (id: string, path: () => string) => void): void {
  design.profiles.forEach((p, i) => {
    visit(p.id, () => `profiles.${i}.id`);
    p.machining.forEach((m, j) => visit(m.id, () => `profiles.${i}.machining.${j}.id`));
  });
  design.joints.forEach((j, i) => visit(j.id, () => `joints.${i}.id`));
  design.panels.forEach((p, i) => {
    visit(p.id, () => `panels.${i}.id`);
    p.cutouts.forEach((c, j) => visit(c.id, () => `panels.${i}.cutouts.${j}.id`));
  });
  design.accessories.forEach((a, i) => visit(a.id, () => `accessories.${i}.id`));
  design.subAssemblies.forEach((s, i) => visit(s.id, () => `subAssemblies.${i}.id`));
  design.steps.forEach((s, i) => visit(s.id, () => `steps.${i}.id`));
  design.loadCases.forEach((l, i) => visit(l.id, () => `loadCases.${i}.id`));
}

export function documentReferenceErrors(design: DesignDocument, catalogue: Catalogue): DocumentError[] {
  const errors: DocumentError[] = [];
  const seen = new Map<string, () => string>();
  forEachId(design, (id, path) => {
    const first = seen.get(id);
    if (first) errors.push({ path: path(), message: `The id "${id}" is already used at ${first()}; every id in a design must be unique` });
    else seen.set(id, path);
  });

  const profiles = new Set(design.profiles.map((p) => p.id));
  const joints = new Set(design.joints.map((j) => j.id));
  const panels = new Set(design.panels.map((p) => p.id));
  const accessories = new Set(design.accessories.map((a) => a.id));
  const subAssemblies = new Set(design.subAssemblies.map((s) => s.id));
  const placeable = (id: string) => profiles.has(id) || joints.has(id) || panels.has(id) || accessories.has(id);
  // Catalogue lists as Sets, built per call (a few dozen entries each) so a changed catalogue is always seen.
  const catalogueIds = new Map<readonly { id: string }[], Set<string>>();
  const has = (list: readonly { id: string }[], id: string): boolean => {
    let set = catalogueIds.get(list);
    if (!set) catalogueIds.set(list, (set = new Set(list.map((x) => x.id))));
    return set.has(id);
  };

  if (!has(catalogue.systems, design.systemId)) {
    errors.push({ path: 'systemId', message: `Unknown profile system "${design.systemId}"; use one of ${catalogue.systems.map((s) => s.id).join(', ')}` });
  }
  if (!has(catalogue.alloys as { id: string }[], design.settings.alloyId)) {
    errors.push({ path: 'settings.alloyId', message: `Unknown alloy "${design.settings.alloyId}"; use one of ${catalogue.alloys.map((a) => a.id).join(', ')}` });
  }

  design.profiles.forEach((p, i) => {
    if (!has(catalogue.variants, p.variantId)) {
      errors.push({ path: `profiles.${i}.variantId`, message: `Profile ${p.id} uses an unknown profile variant "${p.variantId}"` });
    }
    p.machining.forEach((m, j) => {
      if (m.jointId !== undefined && !joints.has(m.jointId)) {
        errors.push({ path: `profiles.${i}.machining.${j}.jointId`, message: `Machining ${m.id} on profile ${p.id} serves joint "${m.jointId}", which does not exist` });
      }
      if (m.offset > p.length) {
        errors.push({ path: `profiles.${i}.machining.${j}.offset`, message: `Machining ${m.id} sits ${m.offset} mm from the ${m.fromEnd}, beyond the profile's length of ${p.length} mm` });
      }
    });
  });

  design.joints.forEach((j, i) => {
    if (!has(catalogue.connectors, j.connectorId)) {
      errors.push({ path: `joints.${i}.connectorId`, message: `Joint ${j.id} uses an unknown connector "${j.connectorId}"` });
    }
    const memberIds = new Set<string>();
    j.members.forEach((m, k) => {
      if (!profiles.has(m.profileId)) {
        errors.push({ path: `joints.${i}.members.${k}.profileId`, message: `Joint ${j.id} names profile "${m.profileId}", which does not exist` });
      }
      if (memberIds.has(m.profileId)) {
        errors.push({ path: `joints.${i}.members.${k}.profileId`, message: `Joint ${j.id} names profile "${m.profileId}" twice` });
      }
      memberIds.add(m.profileId);
      if (m.at === 'span' && m.along === undefined) {
        errors.push({ path: `joints.${i}.members.${k}.along`, message: `Joint ${j.id} meets profile ${m.profileId} along its span: give "along", the distance from its start in mm` });
      }
    });
  });

  design.panels.forEach((p, i) => {
    if (!has(catalogue.panelMaterials, p.materialId)) {
      errors.push({ path: `panels.${i}.materialId`, message: `Panel ${p.id} uses an unknown material "${p.materialId}"` });
    }
    p.boundedBy?.forEach((id, k) => {
      if (!profiles.has(id)) errors.push({ path: `panels.${i}.boundedBy.${k}`, message: `Panel ${p.id} is bounded by profile "${id}", which does not exist` });
    });
    if (p.mounting === 'captured' && !p.boundedBy) {
      errors.push({ path: `panels.${i}.boundedBy`, message: `Captured panel ${p.id} needs the four profiles whose slots hold it ("boundedBy")` });
    }
  });

  design.accessories.forEach((a, i) => {
    if (!has(catalogue.accessories, a.partId)) {
      errors.push({ path: `accessories.${i}.partId`, message: `Accessory ${a.id} uses an unknown part "${a.partId}"` });
    }
    if (a.profileId !== undefined && !profiles.has(a.profileId)) {
      errors.push({ path: `accessories.${i}.profileId`, message: `Accessory ${a.id} is on profile "${a.profileId}", which does not exist` });
    }
    if (a.panelId !== undefined && !panels.has(a.panelId)) {
      errors.push({ path: `accessories.${i}.panelId`, message: `Accessory ${a.id} is on panel "${a.panelId}", which does not exist` });
    }
  });

  design.subAssemblies.forEach((s, i) => {
    s.profileIds.forEach((id, k) => {
      if (!profiles.has(id)) errors.push({ path: `subAssemblies.${i}.profileIds.${k}`, message: `Sub-assembly ${s.id} lists profile "${id}", which does not exist` });
    });
    s.panelIds.forEach((id, k) => {
      if (!panels.has(id)) errors.push({ path: `subAssemblies.${i}.panelIds.${k}`, message: `Sub-assembly ${s.id} lists panel "${id}", which does not exist` });
    });
  });

  design.steps.forEach((s, i) => {
    s.partIds.forEach((id, k) => {
      if (!placeable(id)) errors.push({ path: `steps.${i}.partIds.${k}`, message: `Step "${s.title}" places "${id}", which is not a profile, joint, panel or accessory of this design` });
    });
    if (s.subAssemblyId !== undefined && !subAssemblies.has(s.subAssemblyId)) {
      errors.push({ path: `steps.${i}.subAssemblyId`, message: `Step "${s.title}" belongs to sub-assembly "${s.subAssemblyId}", which does not exist` });
    }
  });

  design.loadCases.forEach((lc, i) => {
    lc.loads.forEach((load, k) => {
      const path = `loadCases.${i}.loads.${k}`;
      if (load.profileId !== undefined && !profiles.has(load.profileId)) {
        errors.push({ path: `${path}.profileId`, message: `Load case "${lc.name}" loads profile "${load.profileId}", which does not exist` });
      }
      if (load.kind === 'uniform') {
        if (load.panelId !== undefined && !panels.has(load.panelId)) {
          errors.push({ path: `${path}.panelId`, message: `Load case "${lc.name}" loads panel "${load.panelId}", which does not exist` });
        }
        if (load.panelId === undefined && load.profileId === undefined) {
          errors.push({ path, message: `A spread load in "${lc.name}" needs a panel or a profile to act on` });
        }
      }
    });
  });

  return errors;
}
