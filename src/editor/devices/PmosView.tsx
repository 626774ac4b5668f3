import { PartFrame, type PartViewProps } from './PartFrame.tsx';

/** PMOS: symbol (gate bubble) plus W/L in µm under the name. */
export function PmosView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} value={`${part.w ?? 2}/${part.l ?? 0.25}`} />;
}
