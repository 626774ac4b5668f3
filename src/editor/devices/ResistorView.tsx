import { engineering } from '../../core/view/format.ts';
import { PartFrame, type PartViewProps } from './PartFrame.tsx';

export function ResistorView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} value={engineering(part.ohms ?? 10e3, 'Ω')} />;
}
