~Version Information
VERS.   2.0 : CWLS log ASCII Standard - VERSION 2.0
WRAP.   YES : Multiple lines per depth step
~Well Information
STRT.M   910.0 : First index value
STOP.M   910.5 : Last index value
STEP.M   0.25  : Step
NULL.    -999.25 : Null value
WELL.    PLOVER CREEK 1 : Well
~Curve Information
DEPT.M        : Depth
GR  .GAPI     : Gamma ray
RHOB.G/CM3    : Bulk density
NPHI.V/V      : Neutron porosity
DT  .US/FT    : Sonic
PEF .B/E      : Photoelectric factor
CALI.IN       : Caliper
~A
910.0
  61.2500   2.3100   0.2800
  92.0000   3.1000   8.5000
910.25
  63.5000   2.3200 -999.2500
  91.5000   3.0500   8.5200
910.5
  70.1250   2.3550   0.2700
  90.0000   2.9900   8.6000
