import { engineering } from '../../core/view/format.ts';
import { PartFrame, type PartViewProps } from './PartFrame.tsx';

export function CapacitorView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} value={engineering(part.farads ?? 10e-15, 'F')} />;
}
