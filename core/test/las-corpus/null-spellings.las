~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  100.0 : start
STOP.FT  101.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    GODWIT 11 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
NPHI.V/V  : neutron porosity
~A
100.0  -999.25     0.20
100.5  -999.2500   0.21
101.0  -9999       -9999.000
101.5  -999.250000 0.23
