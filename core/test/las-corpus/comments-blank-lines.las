# exported by an invented field tool for the Stilt Marsh test well

~VERSION INFORMATION
# the version block
VERS.   2.0 : CWLS LOG ASCII STANDARD - VERSION 2.0

WRAP.   NO  : ONE LINE PER DEPTH STEP
~WELL INFORMATION
#MNEM.UNIT   VALUE   DESCRIPTION
#----------  ------  -----------
STRT.FT  100.0 : START DEPTH

STOP.FT  101.0 : STOP DEPTH
   # indented comment
STEP.FT  0.5   : STEP
NULL.    -999.25 : NULL VALUE
WELL.    STILT MARSH 8 : WELL
~CURVE INFORMATION
DEPT.FT  : DEPTH

GR  .GAPI : GAMMA RAY
~A
# data starts here
100.0  10.5

100.5  11.5
  # a comment between rows
101.0  12.5

