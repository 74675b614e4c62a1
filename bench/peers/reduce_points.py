"""The same point-load reduction written with pandas + numpy, as a user would: read the CSV,
sum the forces and the moments about the first point (taken relative to it to keep precision)."""
import sys
import numpy as np
import pandas as pd

path = sys.argv[1]
df = pd.read_csv(path, usecols=["x", "y", "z", "fx", "fy", "fz"], dtype=np.float64, engine="c")
r = df[["x", "y", "z"]].to_numpy()
f = df[["fx", "fy", "fz"]].to_numpy()
p = r[0].copy()
d = r - p
force = f.sum(axis=0)
moment = np.cross(d, f).sum(axis=0)
print("R", *force)
print("M about", *p, ":", *moment)
