import { PartFrame, type PartViewProps } from './PartFrame.tsx';

/** Input and output pins: the tag and the pin's net name. */
export function PinView({ part, color }: PartViewProps) {
  return <PartFrame part={part} color={color} />;
}
