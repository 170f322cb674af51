~Version	
	VERS.	2.0	:	version   
	WRAP.	NO	:	wrap		
~Well   
	STRT.FT	100.0	:	start   
	STOP.FT	101.0	:	stop
	STEP.FT	0.5	:	step
	NULL.	-999.25	:	null
	WELL.	CURLEW 6 TABS	:	well  
~Curve
	DEPT.FT	:	depth
	GR.GAPI	:	gamma	
~A
100.0	10.5   
	100.5		11.5	
101.0 	 12.5 	 
