import { SafetyNote } from '../../../components/ui/safety-note.js';

/** Shown when the block is frozen or the air is at or below freezing. */
export function FrozenWoodNote() {
  return (
    <SafetyNote title="Frozen wood">
      Competition edges are not tested in frozen wood: frozen fibres chip a thin edge and can crack it. Use practice
      heads only, or wait for the block to thaw.
    </SafetyNote>
  );
}
