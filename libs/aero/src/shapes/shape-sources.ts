import type { ShapeSource } from './shape-entry';

/**
 * Two-dimensional bodies, C_D on A = b·D (b = span length, D = frontal height).
 * Confirmed from a copy of the figure (pp. 354–355 of the printing consulted); the edition number is from memory.
 */
export const MUNSON_2D_BODIES: ShapeSource = {
  citation:
    'B. R. Munson, D. F. Young, T. H. Okiishi, W. W. Huebsch, Fundamentals of Fluid Mechanics, 6th ed. (edition from memory), Wiley, Fig. 9.19 "Typical drag coefficients for regular two-dimensional objects", p. 354',
};

/** Three-dimensional bodies, C_D on the area stated per shape. Confirmed from a copy of the figure, p. 355. */
export const MUNSON_3D_BODIES: ShapeSource = {
  citation:
    'B. R. Munson, D. F. Young, T. H. Okiishi, W. W. Huebsch, Fundamentals of Fluid Mechanics, 6th ed. (edition from memory), Wiley, Fig. 9.20 "Typical drag coefficients for regular three-dimensional objects", p. 355',
};

/** Standard shapes table. Confirmed from a copy of the page; edition and publisher from memory. */
export const DATA_BOOK_STANDARD_SHAPES: ShapeSource = {
  citation:
    'C. Matthews, Aeronautical Engineer\'s Data Book, Butterworth-Heinemann (edition from memory), Fig. 5.13(b) "Drag coefficients for standard shapes", p. 95',
};

/**
 * Bicycle-and-rider entries (racing, drafting, streamlined). The figure attribution is from memory;
 * the values and areas were confirmed in a secondary compilation that reproduces them.
 */
export const MUNSON_OBJECTS: ShapeSource = {
  citation:
    'B. R. Munson, D. F. Young, T. H. Okiishi, W. W. Huebsch, Fundamentals of Fluid Mechanics, Wiley, figure of typical drag coefficients for objects of interest, bicycle entries (figure number from memory)',
  corroboration:
    'The Engineering ToolBox, "Drag Coefficient" page: bike racing 0.88 and drafting 0.5 at 3.9 ft² (0.36 m²); streamlined 0.12 at 5 ft² (0.47 m²)',
};

/** Whole-object table with frontal areas. Confirmed from a reproduction of the table; edition from memory. */
export const WICKERT_OBJECTS: ShapeSource = {
  citation:
    'J. Wickert, K. Lewis, An Introduction to Mechanical Engineering (edition from memory), Cengage, Table 6.4 "Numerical values of the drag coefficient and frontal area for different systems"',
};
