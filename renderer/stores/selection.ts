/**
 * What is selected, shared by the 3D view, the tables, the inspector and the results strip.
 * Ids (not indices) so the selection survives edits that reorder or delete rows.
 */
import { defineStore } from 'pinia';
import { computed, shallowRef } from 'vue';

export type SelectionKind = 'node' | 'member';

export const useSelectionStore = defineStore('selection', () => {
  const nodeIds = shallowRef<ReadonlySet<string>>(new Set());
  const memberIds = shallowRef<ReadonlySet<string>>(new Set());

  const count = computed(() => nodeIds.value.size + memberIds.value.size);
  /** The one selected item when exactly one is selected (for the inspector). */
  const single = computed<{ kind: SelectionKind; id: string } | null>(() => {
    if (count.value !== 1) return null;
    const [n] = nodeIds.value;
    if (n !== undefined) return { kind: 'node', id: n };
    const [m] = memberIds.value;
    return { kind: 'member', id: m };
  });

  function clear(): void {
    nodeIds.value = new Set();
    memberIds.value = new Set();
  }

  /** Select `ids` of `kind`; with `additive` toggle them in the current selection instead. */
  function select(kind: SelectionKind, ids: readonly string[], additive = false): void {
    const target = kind === 'node' ? nodeIds : memberIds;
    if (!additive) {
      clear();
      target.value = new Set(ids);
      return;
    }
    const next = new Set(target.value);
    for (const id of ids) {
      if (next.has(id)) next.delete(id);
      else next.add(id);
    }
    target.value = next;
  }

  function isSelected(kind: SelectionKind, id: string): boolean {
    return (kind === 'node' ? nodeIds.value : memberIds.value).has(id);
  }

  /** Drop ids that no longer exist (after deletes or undo). */
  function prune(existingNodes: ReadonlySet<string>, existingMembers: ReadonlySet<string>): void {
    const n = [...nodeIds.value].filter((id) => existingNodes.has(id));
    const m = [...memberIds.value].filter((id) => existingMembers.has(id));
    if (n.length !== nodeIds.value.size) nodeIds.value = new Set(n);
    if (m.length !== memberIds.value.size) memberIds.value = new Set(m);
  }

  return { nodeIds, memberIds, count, single, clear, select, isSelected, prune };
});
