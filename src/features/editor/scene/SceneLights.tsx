/**
 * Lights only (no environment maps, nothing downloaded): a soft sky/ground fill plus a key and a
 * rim light placed so the slot lips and chambers read as edges. Takes no props.
 */
export function SceneLights() {
  return (
    <>
      <hemisphereLight args={['#f4f7f9', '#6f767c', 1.6]} />
      <directionalLight position={[3000, 5000, 4000]} intensity={2.6} color="#ffffff" />
      <directionalLight position={[-4000, 2000, -2500]} intensity={1.1} color="#dfe9f2" />
      <directionalLight position={[-1500, -2500, 3000]} intensity={0.45} color="#f2eee6" />
    </>
  );
}
