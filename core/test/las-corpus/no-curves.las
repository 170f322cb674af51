~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  100.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    RUFF 19 : well
~C
# no curve lines at all
~A
100.0  40.0
100.5  41.0
