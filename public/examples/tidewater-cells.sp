* Tidewater cells: a made-up starter library for a harbour-buoy beacon controller.
* Railwise example. 0.25 um textbook process, VDD 2.5 V. Widths in metres (u = micrometre).
* Each top-level .subckt is one cell; "* railwise:" lines carry the expected functions.

.model nch nmos (level=1 vto=0.43 kp=115u)
.model pch pmos (level=1 vto=-0.4 kp=30u)

* Inverter, PMOS twice the NMOS width (common practice, no source).
.subckt tw_inv A Y VDD VSS
* railwise: expect Y = !A
MP1 Y A VDD VDD pch W=1u L=0.25u
MN1 Y A VSS VSS nch W=0.5u L=0.25u
.ends tw_inv

* Two-input NAND: series NMOS at twice the inverter's width.
.subckt tw_nand2 A B Y VDD VSS
* railwise: expect Y = !(A & B)
MP1 Y A VDD VDD pch W=1u L=0.25u
MP2 Y B VDD VDD pch W=1u L=0.25u
MN1 Y A n1 VSS nch W=1u L=0.25u ad=0.5p as=0.3p
MN2 n1 B VSS VSS nch W=1u L=0.25u
.ends tw_nand2

* Two-input NOR: series PMOS, four times the NMOS width.
.subckt tw_nor2 A B Y VDD VSS
* railwise: expect Y = !(A | B)
MP1 p1 A VDD VDD pch W=2u L=0.25u
MP2 Y B p1 VDD pch W=2u L=0.25u
MN1 Y A VSS VSS nch W=0.5u L=0.25u
MN2 Y B VSS VSS nch W=0.5u L=0.25u
.ends tw_nor2

* AND-OR-INVERT 2-1: Y = !((A1 & A2) | B).
.subckt tw_aoi21 A1 A2 B Y VDD VSS
* railwise: expect Y = !((A1 & A2) | B)
MP1 p1 A1 VDD VDD pch W=2u L=0.25u
MP2 p1 A2 VDD VDD pch W=2u L=0.25u
MP3 Y B p1 VDD pch W=2u L=0.25u
MN1 Y A1 n1 VSS nch W=1u L=0.25u
MN2 n1 A2 VSS VSS nch W=1u L=0.25u
MN3 Y B VSS VSS nch W=0.5u L=0.25u
.ends tw_aoi21

* 2:1 multiplexer from transmission gates with its own select inverter.
* The data pins reach transistor channels, so the pin directions are given here.
.subckt tw_mux2 D0 D1 S Y VDD VSS
* railwise: inputs D0 D1 S
* railwise: expect Y = S ? D1 : D0
MPI SB S VDD VDD pch W=1u L=0.25u
MNI SB S VSS VSS nch W=0.5u L=0.25u
MN0 D0 SB Y VSS nch W=0.5u L=0.25u
MP0 D0 S Y VDD pch W=1u L=0.25u
MN1 D1 S Y VSS nch W=0.5u L=0.25u
MP1 D1 SB Y VDD pch W=1u L=0.25u
.ends tw_mux2

* Tristate inverter for the shared beacon bus: Y floats when EN = 0.
.subckt tw_tinv A EN Y VDD VSS
* railwise: expect Y = EN ? !A : Z
MPI ENB EN VDD VDD pch W=1u L=0.25u
MNI ENB EN VSS VSS nch W=0.5u L=0.25u
MP1 p1 A VDD VDD pch W=2u L=0.25u
MP2 Y ENB p1 VDD pch W=2u L=0.25u
MN2 Y EN n1 VSS nch W=1u L=0.25u
MN1 n1 A VSS VSS nch W=1u L=0.25u
.ends tw_tinv

* Ratioed NOR for the wide wake-up decoder: an always-on PMOS load, so current flows whenever
* Y is low (by design; reported as static current).
.subckt tw_pnor2 A B Y VDD VSS
* railwise: expect Y = !(A | B)
MPL Y VSS VDD VDD pch W=0.5u L=0.5u
MN1 Y A VSS VSS nch W=1u L=0.25u
MN2 Y B VSS VSS nch W=1u L=0.25u
.ends tw_pnor2

* Decoupling cell: no inputs, no outputs; a capacitor across the rails.
.subckt tw_decap VDD VSS
C1 VDD VSS 20f
.ends tw_decap

.end
