~v
vers.   2.0 : version
wrap.   no  : wrap
~w
strt.ft  100.0 : start
stop.ft  101.0 : stop
step.ft  0.5   : step
null.    -999.25 : null
well.    LAPWING 9 : well
~c
dept.ft  : depth
gr  .gapi : gamma
~a
100.0  10.5
100.5  11.5
101.0  12.5
