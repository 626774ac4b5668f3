import { PartFrame, type PartViewProps } from './PartFrame.tsx';

/** NMOS: symbol plus W/L in µm under the name. */
export function NmosView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} value={`${part.w ?? 1}/${part.l ?? 0.25}`} />;
}
