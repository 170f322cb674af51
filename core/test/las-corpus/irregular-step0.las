~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  2000.0 : start
STOP.FT  2004.7 : stop
STEP.FT  0      : irregular sampling
NULL.    -999.25 : null
~C
DEPT.FT : depth
GR  .GAPI : gamma ray
~A
2000.0  30.0
2000.4  31.0
2001.9  32.0
2004.7  33.0
