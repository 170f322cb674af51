~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  101.0 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    WHIMBREL 13 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
RHOB.G/CC : density
~A
100.0  N/A     2.40
100.5  45.0    1.#IND
101.0  46.0    2.42
