import { createAttitudeLaw } from './src/attitude/attitude-law';
import { createGeocentricEphemeris } from './src/bodies/geocentric-ephemeris';
import { createCentralBodyForce } from './src/propagation/forces/central-body';
import { createDynamics } from './src/propagation/forces/dynamics';
import { createZonalForce } from './src/propagation/forces/earth-zonal';
import { createSrpForce } from './src/propagation/forces/srp-force';
import { createDragForce } from './src/propagation/forces/drag';
import { createMoonThirdBodyForce, createSunThirdBodyForce } from './src/propagation/forces/third-body';
import { parseUtcEpoch } from './src/time/epoch';
import { compileVehicle } from './src/vehicles/compile-vehicle';
const eph = createGeocentricEphemeris(parseUtcEpoch('2026-03-20T00:00:00Z'), 0, 2*86400);
const vehicle = compileVehicle({kind:'plates',name:'x',massKg:1000,centreOfMassM:[0,0,0],plates:[
 {name:'a',areaM2:2,normal:[1,0,0],centroidM:[1,0,0],front:'mli-kapton'},
 {name:'w',areaM2:20,normal:[1,0,0],centroidM:[0,5,0],front:'solar-cell',back:'solar-array-back',trackingAxis:[0,1,0]}]});
const attitude = createAttitudeLaw({law:'sun-pointing',sunAxisBody:[1,0,0],secondaryAxisBody:[0,1,0],secondaryReference:'orbit-normal'});
const which = process.argv[2] ?? 'all';
const forces = {
 none: [],
 central: [createCentralBodyForce(3.986004418e14)],
 zonal: [createZonalForce()],
 sun: [createSunThirdBodyForce(eph)],
 moon: [createMoonThirdBodyForce(eph)],
 srp: [createSrpForce({vehicle, attitude, shadowModel:'conical', centralBody:'earth', ephemeris: eph})],
 drag: [createDragForce({cd:2.2, areaM2:10, massKg:500})],
} as Record<string, any[]>;
const list = which === 'all' ? Object.values(forces).flat() : forces[which]!;
const f = createDynamics(list);
// Times as tagged HeapNumbers (generic elements), as the integrator hands them over: no boxing here.
const times: unknown[] = ['x']; for (let i = 0; i < 4096; i++) times.push(i * 13.7 + 0.25); times.shift();
const y = Float64Array.of(7e6, 1e5, 2e5, 0, 7500, 100); const dydt = new Float64Array(6);
const N = Number(process.argv[3] ?? 4000000); for (let i=0;i<N;i++){ f(dydt, times[i & 4095] as number, y); }
console.log('done');
