import { PartFrame, type PartViewProps } from './PartFrame.tsx';

/** VDD and GND rails: the symbol and the rail's net name. */
export function RailView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} />;
}
