// The three.js classes the 3D views declare as JSX elements (<mesh>, <group>, <lineSegments>…).
// The renderer's Canvas fills its catalogue of elements from `import * as THREE from 'three'`,
// which would keep every class of three.js in the client's bundle; the build hands it this module
// instead (vite.config.ts), so only these are kept and the rest is left out. An element used in a
// view but missing here fails loudly ("is not part of the THREE namespace"); three-catalogue.test.ts
// reads the views' elements and holds this list to them.
export { Color, DirectionalLight, Group, HemisphereLight, LineSegments, Mesh, SpotLight } from 'three';
