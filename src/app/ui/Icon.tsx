/** Navigation icons: simple strokes of our own, decorative (the label beside them carries the meaning). */
const PATHS: Record<string, string> = {
  depth: 'M3 5h18M3 9.5h18M3 14h12M3 18.5h6',
  cycle: 'M2 19h3l3-12h5v5h4l2 7h3',
  recovery: 'M12 7v5l3 3M4.5 12a7.5 7.5 0 1 0 2.2-5.3M4 3.5v4h4',
  convert: 'M4 8h14l-3-3M20 16H6l3 3',
  log: 'M9 3.5h6v3H9zM7 5H5v16h14V5h-2M8.5 11h7M8.5 15h7M8.5 19h4',
  settings: 'M4 7h9M17 7h3M4 17h3M11 17h9M15 5v4M9 15v4',
  safety: 'M12 3l9.5 17h-19zM12 10v4.5M12 17.2v.1',
  up: 'M12 19V5M6 11l6-6 6 6',
  down: 'M12 5v14M6 13l6 6 6-6',
  copy: 'M9 9h11v11H9zM5 15H4V4h11v1',
  remove: 'M6 6l12 12M18 6L6 18',
};

export function Icon({ name }: { name: keyof typeof PATHS }) {
  return (
    <svg class="icon" viewBox="0 0 24 24" width="24" height="24" aria-hidden="true" focusable="false">
      <path
        d={PATHS[name]}
        fill="none"
        stroke="currentColor"
        stroke-width="2"
        stroke-linecap="round"
        stroke-linejoin="round"
      />
    </svg>
  );
}
