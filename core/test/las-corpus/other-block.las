~Version
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~Well
STRT.FT  100.0 : start
STOP.FT  100.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    SANDERLING 16 : well
~Parameter
BHT .DEGC   71.5 : bottom hole temperature
MUD .       WATER BASED : mud type
~Other
Tool stuck at 100.2 ft on the first pass.
  Second pass logged up from TD.
~Curve
DEPT.FT   : depth
GR  .GAPI : gamma ray
~A
100.0  40.0
100.5  41.0
~Other
Remarks written after the data by a careless exporter.
