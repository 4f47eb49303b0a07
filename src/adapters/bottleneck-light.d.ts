/**
 * `bottleneck/light.js` is the package's build without its Redis clustering, the one the
 * throttling plugin itself loads; the package ships types for its main entry only, and both
 * entries export the same class.
 */
declare module 'bottleneck/light.js' {
  import Bottleneck from 'bottleneck';
  export default Bottleneck;
}
