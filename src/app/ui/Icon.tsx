/** Icons: simple strokes of our own, decorative (the label beside them carries the meaning). */
const CONTROLS = {
  up: 'M12 19V5M6 11l6-6 6 6',
  down: 'M12 5v14M6 13l6 6 6-6',
  copy: 'M9 9h11v11H9zM5 15H4V4h11v1',
  remove: 'M6 6l12 12M18 6L6 18',
};

/** The icon of a list control (move, duplicate, remove). */
export function Icon({ name }: { name: keyof typeof CONTROLS }) {
  return <StrokeIcon path={CONTROLS[name]} />;
}

/** Any stroke path on a 24 × 24 grid (the screens' own icons live in their table). */
export function StrokeIcon({ path }: { path: string }) {
  return (
    <svg class="icon" viewBox="0 0 24 24" width="24" height="24" aria-hidden="true" focusable="false">
      <path
        d={path}
        fill="none"
        stroke="currentColor"
        stroke-width="2"
        stroke-linecap="round"
        stroke-linejoin="round"
      />
    </svg>
  );
}
