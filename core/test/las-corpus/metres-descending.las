~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.M   1005.0 : start
STOP.M   1004.0 : stop
STEP.M   -0.5   : step
NULL.    -999.25 : null
~C
DEPTH.M     : depth
CALI .IN    : caliper
~A
1005.0  8.50
1004.5  8.75
1004.0  9.00
