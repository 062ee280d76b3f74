/** Cookie jars for route-handler tests: one per simulated browser, switched with `useJar`. */
const jars = new Map<string, Map<string, string>>();
let current = "default";

export function currentJar(): Map<string, string> {
  let jar = jars.get(current);
  if (!jar) jars.set(current, (jar = new Map()));
  return jar;
}

export function useJar(name: string): void {
  current = name;
}
