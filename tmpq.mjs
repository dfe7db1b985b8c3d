const N = 480000; const a = new Float64Array(N).map(()=>Math.random()); const b = new Float64Array(N)
const c = [0.01,0,-0.01,-1.9,0.95, 0.02,0,-0.02,-1.91,0.951, 0.03,0,-0.03,-1.92,0.952]
function fused3(c, x, y, reverse) {
  const b00=c[0],b01=c[1],b02=c[2],a01=c[3],a02=c[4], b10=c[5],b11=c[6],b12=c[7],a11=c[8],a12=c[9], b20=c[10],b21=c[11],b22=c[12],a21=c[13],a22=c[14]
  let p1=0,p2=0,q1=0,q2=0,r1=0,r2=0
  const n = x.length
  for (let k = 0; k < n; k++) {
    const i = reverse ? n-1-k : k
    const x0 = x[i]
    const y0 = b00*x0 + p1; p1 = b01*x0 - a01*y0 + p2; p2 = b02*x0 - a02*y0
    const y1 = b10*y0 + q1; q1 = b11*y0 - a11*y1 + q2; q2 = b12*y0 - a12*y1
    const y2 = b20*y1 + r1; r1 = b21*y1 - a21*y2 + r2; r2 = b22*y1 - a22*y2
    y[i] = y2
  }
}
for (let r=0;r<5;r++){ const t=performance.now(); for (let k=0;k<26;k++) fused3(c, a, b, k%2===0); console.log('fused', performance.now()-t) }
