# Writes a pressure-map CSV with one row per triangle (x1..z3, p1..p3) of N triangles for the
# benchmark: a wavy roof surface split into triangles, pressure varying over it.
BEGIN {
  srand(20261202)
  print "x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3"
  side = int(sqrt(n / 2)) + 1
  count = 0
  for (i = 0; i < side && count < n; i++) {
    for (j = 0; j < side && count < n; j++) {
      x0 = i * 0.25; y0 = j * 0.25; x1 = x0 + 0.25; y1 = y0 + 0.25
      z00 = 12 + 0.3 * sin(x0); z10 = 12 + 0.3 * sin(x1)
      p00 = -0.8 + 0.01 * x0 - 0.002 * y0 + 0.05 * rand(); p10 = p00 + 0.0025; p01 = p00 - 0.0005; p11 = p00 + 0.002
      printf "%.4f,%.4f,%.5f,%.4f,%.4f,%.5f,%.4f,%.4f,%.5f,%.5f,%.5f,%.5f\n", x0, y0, z00, x1, y0, z10, x1, y1, z10, p00, p10, p11
      count++
      if (count < n) {
        printf "%.4f,%.4f,%.5f,%.4f,%.4f,%.5f,%.4f,%.4f,%.5f,%.5f,%.5f,%.5f\n", x0, y0, z00, x1, y1, z10, x0, y1, z00, p00, p11, p01
        count++
      }
    }
  }
}
