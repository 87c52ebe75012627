'use client';

import Link from '@/components/ui/Link';
import type { DesignSummary, VariantSummary } from '@/lib/variants/queries';
import { ConfirmButton } from './ConfirmButton';
import { InlineName } from './InlineName';
import { ChangedAgo } from './ChangedAgo';
import { copyName, designHref, studioHref } from './list-helpers';
import { btn } from './styles';
import type { useDesignMutations } from './useDesigns';

type Mutations = ReturnType<typeof useDesignMutations>;

/** One design with its variants and what can be done to each. */
export function DesignCard({
  design,
  canEdit,
  mutations: m,
  selected,
  onToggleSelect,
}: {
  design: DesignSummary;
  canEdit: boolean;
  mutations: Mutations;
  selected: number[];
  onToggleSelect: (variantId: number) => void;
}) {
  const pending = design.id < 0;
  const names = design.variants.map((v) => v.name);
  return (
    <li
      className="rounded-lg border border-basalt-200 bg-white p-4 shadow-sm"
      aria-busy={pending}
      data-testid="design-card"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-lead font-semibold text-basalt-900">
          <InlineName
            name={design.name}
            label="design"
            editable={canEdit && !pending}
            onRename={(name) => m.renameDesign.mutate({ id: design.id, name })}
          />
        </h3>
        <div className="flex items-center gap-2 text-caption text-basalt-500">
          <span>
            changed <ChangedAgo iso={design.updatedAt} />
          </span>
          {!pending && (
            <Link className={btn.small} href={designHref(design.id)}>
              Sharing &amp; export
            </Link>
          )}
          {canEdit && !pending && (
            <ConfirmButton
              className={btn.danger}
              question={`Delete “${design.name}” and its ${design.variants.length} variant(s)?`}
              onConfirm={() => m.deleteDesign.mutate({ id: design.id })}
            >
              Delete design
            </ConfirmButton>
          )}
        </div>
      </div>
      <ul className="mt-3 divide-y divide-basalt-100">
        {design.variants.map((v) => (
          <VariantRow
            key={v.id}
            variant={v}
            designId={design.id}
            canEdit={canEdit}
            isOnly={design.variants.length === 1}
            selected={selected.includes(v.id)}
            onToggleSelect={() => onToggleSelect(v.id)}
            onDuplicate={() =>
              m.duplicateVariant.mutate({ designId: design.id, from: v, name: copyName(v.name, names) })
            }
            onRename={(name) => m.renameVariant.mutate({ id: v.id, name })}
            onDelete={() => m.deleteVariant.mutate({ id: v.id })}
          />
        ))}
      </ul>
    </li>
  );
}

function VariantRow({
  variant: v,
  canEdit,
  isOnly,
  selected,
  onToggleSelect,
  onDuplicate,
  onRename,
  onDelete,
}: {
  variant: VariantSummary;
  designId: number;
  canEdit: boolean;
  isOnly: boolean;
  selected: boolean;
  onToggleSelect: () => void;
  onDuplicate: () => void;
  onRename: (name: string) => void;
  onDelete: () => void;
}) {
  const pending = v.id < 0;
  return (
    <li
      className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2"
      data-testid="variant-row"
      aria-busy={pending}
    >
      <label className="flex items-center gap-2" title="Choose two variants to compare them">
        <input
          type="checkbox"
          checked={selected}
          disabled={pending}
          onChange={onToggleSelect}
          aria-label={`Compare ${v.name}`}
        />
      </label>
      <InlineName
        name={v.name}
        label="variant"
        editable={canEdit && !pending}
        onRename={onRename}
        className="min-w-40 text-body text-basalt-900"
      />
      <span className="text-caption text-basalt-500">
        version {v.version} · <ChangedAgo iso={v.updatedAt} />
      </span>
      <span className="ml-auto flex items-center gap-1">
        {!pending && (
          <Link className={btn.small} href={studioHref(v.id)}>
            {canEdit ? 'Open in studio' : 'View'}
          </Link>
        )}
        {canEdit && (
          <button type="button" className={btn.small} disabled={pending} onClick={onDuplicate}>
            Duplicate
          </button>
        )}
        {canEdit && !isOnly && (
          <ConfirmButton
            className={btn.danger}
            disabled={pending}
            question={`Delete “${v.name}”?`}
            onConfirm={onDelete}
          >
            Delete
          </ConfirmButton>
        )}
      </span>
    </li>
  );
}
