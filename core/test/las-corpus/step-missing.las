~V
VERS.  2.0 : LAS 2.0
WRAP.  NO  : one line per step
~W
STRT.FT  300.0 : start
STOP.FT  301.0 : stop
NULL.    -999.25 : null
~C
DEPT.FT : depth
SP  .MV : spontaneous potential
~A
300.0  -12.0
300.5  -14.0
301.0  -15.5
