~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  100.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    DUNLIN 10 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray run 1
GR  .GAPI : gamma ray run 2
RHOB.G/CC : density
~A
100.0  40.0  42.0  2.40
100.5  41.0  43.0  2.41
