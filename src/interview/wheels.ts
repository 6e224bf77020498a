/** The four wheels of the brake questions: keys as in the case file, ids of the answers. */
export const WHEELS = [
  { key: 'frontLeft', id: 'fl', label: 'front left' },
  { key: 'frontRight', id: 'fr', label: 'front right' },
  { key: 'rearLeft', id: 'rl', label: 'rear left' },
  { key: 'rearRight', id: 'rr', label: 'rear right' },
] as const;
