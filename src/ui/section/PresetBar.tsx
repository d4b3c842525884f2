import { SECTION_PRESETS, type SectionPreset } from './presets';

/** Buttons that replace the editor's contents with a ready-made section. */
export function PresetBar({ onPick }: { onPick: (p: SectionPreset) => void }) {
  return (
    <div class="section-presets" role="group" aria-labelledby="sec-presets-title">
      <p id="sec-presets-title" class="section-control-label">Start from</p>
      <div class="section-preset-buttons">
        {SECTION_PRESETS.map((p) => (
          <button key={p.id} type="button" class="btn" title={p.about} onClick={() => onPick(p)}>
            {p.label}
          </button>
        ))}
      </div>
    </div>
  );
}
