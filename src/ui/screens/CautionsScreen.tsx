import { CAUTIONS, PLATE_MODEL_LIMITS } from '../../text/cautions';

/** The full cautions page, linked from the caution line on every screen. */
export function CautionsScreen() {
  return (
    <section class="screen" aria-labelledby="screen-title">
      <h1 id="screen-title" tabIndex={-1}>Cautions</h1>
      <p class="lead">Read these before you rely on any number from Wetmode.</p>
      <ol class="cautions">
        {CAUTIONS.map((c) => (
          <li key={c.title}>
            <h2>{c.title}</h2>
            <p>{c.text}</p>
            {c.title === PLATE_MODEL_LIMITS.title && <p>For plate panels: {PLATE_MODEL_LIMITS.text}</p>}
          </li>
        ))}
      </ol>
    </section>
  );
}
