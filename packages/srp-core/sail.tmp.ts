import { createSailConeClockLaw } from './src/attitude/sail-cone-clock-law';
import { createLocallyOptimalSteering } from './src/attitude/sail-optimal-steering';
import { compileVehicle } from './src/vehicles/compile-vehicle';
import { integrate } from './src/propagation/integrator/integrate';
import { cartesianToKeplerian, createKeplerianElements } from './src/propagation/kepler';
import { createCentralBodyForce } from './src/propagation/forces/central-body';
import { createDynamics } from './src/propagation/forces/dynamics';
import { createSrpForce } from './src/propagation/forces/srp-force';
const AU=149597870700, MU=1.32712440018e20, DEG=Math.PI/180, S0=1361, C=299792458;
for (const area of [1600, 160]) {
const sail = compileVehicle({kind:'sail',name:'s',massKg:100,centreOfMassM:[0,0,0],areaM2:area,normal:[1,0,0],centroidM:[0,0,0],optics:'ideal'});
const beta=((2*(S0/C)*area)/100)/(MU/AU**2);
const law = createSailConeClockLaw({ normalAxisBody: [1,0,0], steering: createLocallyOptimalSteering({ goal: 'raise' }) });
const srp = createSrpForce({ vehicle: sail, attitude: law, shadowModel: 'none', centralBody: 'sun', ephemeris: null });
const v=Math.sqrt(MU/AU); const y0=Float64Array.of(AU,0,0,0,v*Math.cos(23.44*DEG),v*Math.sin(23.44*DEG));
const k=3*beta*Math.sqrt(MU)*(2/(3*Math.sqrt(3)));
for (const days of [1,5,10,20,40]) {
 const span=days*86400; const r=integrate(createDynamics([createCentralBodyForce(MU),srp]),0,y0,span,{relTol:1e-11,absTol:1e-6});
 const el=createKeplerianElements(); cartesianToKeplerian(el,r.y,MU);
 const aWant=(AU**1.5+k*span)**(2/3);
 console.log(area, days, ((el.semiMajorAxisM-AU)/(aWant-AU)-1).toExponential(3), el.eccentricity.toExponential(2), r.stats.steps);
}}
