~Version
VERS.                  3.0 : CWLS LOG ASCII STANDARD - VERSION 3.0
WRAP.                   NO : One line per depth step
DLM .                COMMA : Column data section delimiter
~Well
STRT.M             1200.00 : First Index Value
STOP.M             1200.30 : Last Index Value
STEP.M                0.15 : Step increment
NULL.              -999.25 : Null value
WELL.      SANDPIPER FLATS 2 : Well name
DATE.  2021-06-04 09:15:00 : Log date {YYYY-MM-DD hh:mm:ss}
~Log_Parameter
BS  .MM             215.90 : Bit size {F}
RMF .OHMM            0.120 : Mud filtrate resistivity {F} | Run[1]
~Log_Definition
DEPT.M                     : Depth {F}
GR  .API                   : Gamma ray {F}
RHOB.K/M3                  : Bulk density {F}
NPHI.%                     : Neutron porosity {F}
~Log_Data | Log_Definition
1200.00, 55.10, 2450.0, 21.5
1200.15, 57.30, -999.25, 22.0
1200.30,      , 2480.0, 19.8
~Tops_Definition
TOPT.     : Top name {S}
TOPD.M    : Top depth {F}
~Tops_Data | Tops_Definition
"Sandpiper Sand", 1200.10
