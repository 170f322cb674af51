~Version
VERS.                  3.0 : CWLS LOG ASCII STANDARD - VERSION 3.0
WRAP.                   NO : One line per depth step
DLM .                SPACE : Column data section delimiter
~Well
STRT.FT             5000.0 : First Index Value
STOP.FT             5001.0 : Last Index Value
STEP.FT                0.5 : Step increment
NULL.              -999.25 : Null value
WELL.        OYSTERCATCHER 24 : Well name
TIME.          09:15:00 : Time on bottom {hh:mm:ss}
~Parameter
BHT .DEGF            180.0 : Bottom hole temperature {F}
~Curve
DEPT.FT                     : Depth {F}
ILD .OHMM                   : Deep induction resistivity {E0.00} | Run[1]
PEF .B/E                    : Photoelectric factor {F}
~Ascii
5000.0  12.5  2.81
5000.5  13.0  2.79
5001.0  14.5  2.75
