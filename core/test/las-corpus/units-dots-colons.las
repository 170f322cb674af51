~Version
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~Well
STRT.M   50.0 : start
STOP.M   50.5 : stop
STEP.M   0.5  : step
NULL.    -999.25 : null
WELL.    PHALAROPE 17 : well
DATE.    2019-03-12 10:30:00 : Log date and time
TIME.HH:MM   14:45 : Time logger on bottom
RUN .        : run number (empty value)
EKB .M       101.3 : Elevation Kelly bushing
~Curve
DEPT.M       : depth
RDEP.OHM.M   : deep resistivity, unit with a dot
RHOB.G/CM3   : bulk density
DTC .US/M    : compressional slowness
CALI.0.1IN   : caliper in tenths of an inch
FLAG.        : quality flag, no unit
~A
50.0  20.0  2.35  300.0  85.0  1
50.5  21.0  2.36  301.0  86.0  0
