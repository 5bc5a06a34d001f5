export interface Margins {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

export const DEFAULT_MARGINS: Margins = { top: 12, right: 16, bottom: 44, left: 56 };

export function innerSize(width: number, height: number, m: Margins = DEFAULT_MARGINS) {
  return { innerWidth: Math.max(10, width - m.left - m.right), innerHeight: Math.max(10, height - m.top - m.bottom) };
}
