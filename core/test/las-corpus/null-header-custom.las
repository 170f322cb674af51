~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.M   10.0 : start
STOP.M   11.0 : stop
STEP.M   0.5  : step
NULL.    -1e30 : null
WELL.    GODWIT 12 : well
~C
DEPT.M    : depth
GR  .GAPI : gamma ray
~A
10.0  -1.0E+30
10.5  -999.25
11.0  -1e30
