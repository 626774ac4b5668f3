import { useMemo, useState } from 'react';
import { Label, Layer, Tag, Text } from 'react-konva';
import type { SheetWire } from '../../core/sheet/types.ts';
import { formatVolts } from '../../core/view/format.ts';
import { traceRoute } from '../../core/view/traceRoute.ts';
import { lookOf, type NetState } from '../../core/view/visualLanguage.ts';
import { partSpec } from '../../core/sheet/parts/index.ts';
import { useSimulation } from '../../state/simulation.ts';
import { useStore } from '../../state/store.ts';
import { CurrentTrace } from './CurrentTraces.tsx';
import { DeviceMark } from './DeviceMarks.tsx';
import { NetMark, WireLevel } from './WireLevels.tsx';
import { PartLevels } from './PinLevels.tsx';
import type { SolvedView } from '../../core/view/solvedView.ts';
import type { SheetGeometry } from '../../state/document.ts';

type Hover = { net: string; x: number; y: number } | null;

/** The first wire of each net: where its level mark is written. */
function firstWires(
  wires: readonly SheetWire[],
  wireNets: Readonly<Record<string, string>>,
): Map<string, SheetWire> {
  const first = new Map<string, SheetWire>();
  for (const w of wires) {
    const net = wireNets[w.id];
    if (net !== undefined && !first.has(net)) first.set(net, w);
  }
  return first;
}

/** Each pin's net state, by pin name, for one part. */
function pinStatesOf(
  partId: string,
  pins: readonly string[],
  geometry: SheetGeometry,
  live: SolvedView,
): Record<string, NetState | undefined> {
  return Object.fromEntries(
    pins.map((pin) => [pin, live.nets.get(geometry.pinNets[`${partId}.${pin}`] ?? '')]),
  );
}

function HoverReadout({ hover }: { hover: NonNullable<Hover> }) {
  const state = useSimulation((s) => s.live?.nets.get(hover.net));
  if (state === undefined) return null;
  return (
    <Label x={hover.x + 0.4} y={hover.y - 1.2} listening={false}>
      <Tag fill="#ffffff" stroke="#2b2d33" strokeWidth={0.04} cornerRadius={0.12} />
      <Text
        text={`${hover.net}  ${formatVolts(state.volts)}  ${lookOf(state).description}`}
        fontSize={0.55}
        padding={0.2}
        fill="#2b2d33"
      />
    </Label>
  );
}

/**
 * The simulation drawn over the sheet for the selected vector: every wire in its level's look with a
 * mark, each transistor's on/off/maybe shape, static current paths as glowing traces with arrows and
 * their current, and the estimated voltage of the wire under the pointer.
 */
export function SimulationOverlay() {
  const live = useSimulation((s) => s.live);
  const sheet = useStore((s) => s.doc.sheet);
  const geometry = useStore((s) => s.geometry);
  const scale = useStore((s) => s.viewport.scale);
  const [hover, setHover] = useState<Hover>(null);
  const routes = useMemo(
    () =>
      live === null
        ? []
        : live.traces.map((t) => ({ trace: t, route: traceRoute(sheet, geometry, t.chain) })),
    [live, sheet, geometry],
  );
  const marks = useMemo(() => firstWires(sheet.wires, geometry.wireNets), [sheet, geometry]);
  if (live === null) return null;
  return (
    <Layer>
      {sheet.wires.map((w) => {
        const net = geometry.wireNets[w.id];
        const state = net === undefined ? undefined : live.nets.get(net);
        return net === undefined || state === undefined ? null : (
          <WireLevel key={w.id} wire={w} net={net} state={state} scale={scale} onHover={setHover} />
        );
      })}
      {sheet.parts.map((p) => (
        <PartLevels
          key={`levels-${p.id}`}
          part={p}
          pinStates={pinStatesOf(
            p.id,
            partSpec(p.kind).pins.map((q) => q.name),
            geometry,
            live,
          )}
          scale={scale}
        />
      ))}
      {[...marks].map(([net, w]) => {
        const state = live.nets.get(net);
        return state === undefined ? null : <NetMark key={net} wire={w} state={state} />;
      })}
      {sheet.parts.map((p) => {
        const conduction =
          p.kind === 'nmos' || p.kind === 'pmos'
            ? live.devices.get(geometry.partDevices[p.id] ?? '')
            : undefined;
        return conduction === undefined ? null : <DeviceMark key={p.id} part={p} conduction={conduction} />;
      })}
      {routes.map(({ trace, route }, i) =>
        route === null ? null : (
          <CurrentTrace key={`${trace.chain.join('>')}-${i}`} route={route} current={trace.current} />
        ),
      )}
      {hover !== null && <HoverReadout hover={hover} />}
    </Layer>
  );
}
