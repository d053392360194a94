import { measure } from './bench/measure';
import { createGeocentricEphemeris } from './src/bodies/geocentric-ephemeris';
import { evaluateChebyshevTable } from './src/bodies/chebyshev-table';
import { createTableMemo } from './src/propagation/forces/ephemeris-cache';
import { parseUtcEpoch } from './src/time/epoch';
const eph = createGeocentricEphemeris(parseUtcEpoch('2026-03-20T00:00:00Z'), 0, 2*86400);
const out:[number,number,number]=[0,0,0]; let t=0; const sink=new Float64Array(1);
const memo = createTableMemo(eph.sun);
let worst=0; for (let tt=0; tt<1.7e5; tt+=123.4){ evaluateChebyshevTable(out, eph.sun, tt); const v=memo.at(tt); worst=Math.max(worst, Math.abs(v[0]-out[0]),Math.abs(v[1]-out[1]),Math.abs(v[2]-out[2])); }
console.log('max diff m', worst);
for (let r=0;r<2;r++){
measure('cheb direct', 1, ()=>{ t+=0.37; if (t>1e5) t=0; evaluateChebyshevTable(out, eph.sun, t); sink[0]+=out[0]; });
measure('memo fused', 1, ()=>{ t+=0.37; if (t>1e5) t=0; sink[0]+=memo.at(t)[0]; });
}
