// Test matrices from the literature shared by the engine tests.

// The Rosser test matrix (J. B. Rosser, C. Lanczos, M. R. Hestenes, W. Karush, "Separation of close
// eigenvalues of a real symmetric matrix", J. Res. Nat. Bur. Standards 47 (1951)). Entries written
// from memory; the charpoly check below (and the SymPy differential test) guard them.
export const ROSSER = [
  [611, 196, -192, 407, -8, -52, -49, 29],
  [196, 899, 113, -192, -71, -43, -8, -44],
  [-192, 113, 899, 196, 61, 49, 8, 52],
  [407, -192, 196, 611, 8, 44, 59, -23],
  [-8, -71, 61, 8, 411, -599, 208, 208],
  [-52, -43, 49, 44, -599, 411, 208, 208],
  [-49, -8, 8, 59, 208, 208, 99, -911],
  [29, -44, 52, -23, 208, 208, -911, 99],
];
