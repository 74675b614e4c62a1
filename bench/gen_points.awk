# Writes a point-load CSV (id,x,y,z,fx,fy,fz) of N rows for the benchmark: forces on a 200 m × 50 m
# deck grid at site coordinates, mostly downward, with a deterministic pseudo-random spread.
BEGIN {
  srand(20261201)
  print "id,x,y,z,fx,fy,fz"
  for (i = 0; i < n; i++) {
    printf "p%d,%.6f,%.6f,%.4f,%.5f,%.5f,%.5f\n", i, 512000 + rand() * 200, 6170000 + rand() * 50, 40 + rand(), \
      rand() - 0.5, rand() - 0.5, -1 - rand() * 20
  }
}
