import { useId } from 'react';
import { defaultCatalogue, getVariant, variantsForSystem } from '@/domain/catalogue';
import { controlClasses } from '@/components/ui';
import { cn } from '@/lib/cn';
import { useEditorStore } from '../store/editorStore';

/** Shown over the model while drawing: which system and profile the draw tool lays down, and how to use it. */
export function DrawSettingsCard() {
  const variantId = useEditorStore((state) => state.drawSystemVariantId);
  const setDrawVariant = useEditorStore((state) => state.setDrawVariant);
  const systemFieldId = useId();
  const variantFieldId = useId();
  const catalogue = defaultCatalogue;
  const variant = getVariant(catalogue, variantId);
  const systemId = variant?.systemId ?? catalogue.systems[0].id;
  const variants = variantsForSystem(catalogue, systemId);

  return (
    <section
      aria-label="Draw settings"
      className="pointer-events-auto flex w-64 flex-col gap-2 rounded-card border border-paper-line bg-paper-raised/95 p-3 text-sm shadow-md backdrop-blur"
    >
      <h2 className="font-semibold text-ink">Draw a profile</h2>
      <label htmlFor={systemFieldId} className="text-xs font-medium text-ink-soft">
        System
      </label>
      <select
        id={systemFieldId}
        className={cn(controlClasses, 'min-h-10 text-sm')}
        value={systemId}
        onChange={(event) => {
          const next = catalogue.systems.find((system) => system.id === event.target.value);
          if (next) setDrawVariant(next.defaultVariantId);
        }}
      >
        {catalogue.systems.map((system) => (
          <option key={system.id} value={system.id}>
            {system.name}
          </option>
        ))}
      </select>
      <label htmlFor={variantFieldId} className="text-xs font-medium text-ink-soft">
        Profile
      </label>
      <select id={variantFieldId} className={cn(controlClasses, 'min-h-10 text-sm')} value={variantId} onChange={(event) => setDrawVariant(event.target.value)}>
        {variants.map((option) => (
          <option key={option.id} value={option.id}>
            {option.name}
          </option>
        ))}
      </select>
      <p className="text-xs text-ink-muted">
        Click a start point, then an end point. Points snap to profile ends, face centres, slot lines and the grid. Esc stops drawing.
      </p>
    </section>
  );
}
