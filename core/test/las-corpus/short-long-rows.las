~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  101.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    KNOT 14 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
RHOB.G/CC : density
~A
100.0  40.0  2.40
100.5  41.0
101.0  42.0  2.42  9.99
101.5  43.0  2.43
