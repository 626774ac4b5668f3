* Tidewater NAND2 with a wiring slip: MN1's source went to VDD instead of the stack node.
* Railwise example of a failing check (exit status 1): with A=B=1 the output is pulled only to a
* degraded high through MN1 instead of low, and the stack node n1 dangles.
.subckt tw_nand2_slip A B Y VDD VSS
* railwise: expect Y = !(A & B)
MP1 Y A VDD VDD pch W=1u L=0.25u
MP2 Y B VDD VDD pch W=1u L=0.25u
MN1 Y A VDD VSS nch W=1u L=0.25u
MN2 n1 B VSS VSS nch W=1u L=0.25u
.ends
.end
