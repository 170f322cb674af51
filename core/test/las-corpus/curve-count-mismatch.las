~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  101.0 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    RUFF 20 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
~A
100.0  40.0  2.40  0.20
100.5  41.0  2.41  0.21
101.0  42.0  2.42  0.22
