import type { BackerCell, JointType, MovementClass } from '@shared/calc/joints/schema';
import type { Exposure, SurfaceFinish } from '@shared/calc/joints/surface-temperature';

export const JOINT_TYPE_LABELS: Record<JointType, string> = {
  panel_vertical: 'Vertical panel joint',
  panel_horizontal: 'Horizontal panel joint',
  perimeter: 'Perimeter (panel to other construction)',
  corner: 'Corner joint',
  other: 'Other',
};

/** ASTM C920 classes in words: symmetric ones ±X %, 100/50 = +100 % / −50 %. */
export const MOVEMENT_CLASS_LABELS: Record<MovementClass, string> = {
  '12.5': 'Class 12½ (±12.5 %)',
  '25': 'Class 25 (±25 %)',
  '35': 'Class 35 (±35 %)',
  '50': 'Class 50 (±50 %)',
  '100/50': 'Class 100/50 (+100 % / −50 %)',
};

export const BACKER_LABELS: Record<BackerCell, string> = {
  closed_cell: 'Closed-cell rod',
  open_cell: 'Open-cell rod',
};

export const FINISH_LABELS: Record<SurfaceFinish, string> = {
  light: 'Light (white, silver, light grey)',
  medium: 'Medium (mid greys, greens, reds)',
  dark: 'Dark (dark bronze, charcoal, black)',
};

export const EXPOSURE_LABELS: Record<Exposure, string> = {
  sun: 'In sun',
  shade: 'Always shaded',
};

export const GOVERNING_LABELS = {
  extension: 'opening governs',
  compression: 'closing governs',
  minimum: 'minimum width governs',
} as const;
