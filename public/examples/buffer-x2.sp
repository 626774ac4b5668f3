* Beacon lamp driver buffer: two inverters in a row, built from one inverter subcircuit.
* Railwise example: hierarchical netlist; each subcircuit is a cell, and the check flattens it
* with hierarchical names (net X1.out is mid here, devices X2.MP1).
.subckt lamp_inv in out vdd gnd
MP1 out in vdd vdd pmos_rw W=2u L=0.25u
MN1 out in gnd gnd nmos_rw W=1u L=0.25u
.ends lamp_inv

.subckt lamp_buf A Y vdd gnd
* railwise: expect Y = A
X1 A mid vdd gnd lamp_inv
X2 mid Y vdd gnd lamp_inv m=1  $ m on an instance is ignored with a note
CL Y gnd 15f
.ends lamp_buf
.end
