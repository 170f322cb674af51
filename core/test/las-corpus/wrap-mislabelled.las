~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : says NO, but the rows are wrapped
~W
STRT.FT  100.0 : start
STOP.FT  100.5 : stop
STEP.FT  0.5   : step
NULL.    -999.25 : null
WELL.    REDSHANK 22 : well
~C
DEPT.FT   : depth
GR  .GAPI : gamma ray
RHOB.G/CC : density
NPHI.V/V  : neutron porosity
~A
100.0
40.0  2.40  0.20
100.5
41.0  2.41  0.21
