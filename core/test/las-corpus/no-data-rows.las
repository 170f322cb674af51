~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  100.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    RUFF 21 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
~A
# the export stopped before writing any row
