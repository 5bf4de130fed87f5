import { phSolubilityEvalHandler } from './ph-solubility-kind';
import { evalRegistry, type EvalRegistry } from './registry';
import { saltEvalHandler } from './salt-kind';

/**
 * Register the request kinds `saltsmith eval` ships with: `salt` and `ph-solubility`. Called once from
 * main.ts (and by tests); calling it again changes nothing. To add a kind, write its schema and
 * handler in its own module and add one line here.
 */
export function registerBuiltInEvalKinds(registry: EvalRegistry = evalRegistry): EvalRegistry {
  if (!registry.has('salt')) registry.register('salt', saltEvalHandler);
  if (!registry.has('ph-solubility')) registry.register('ph-solubility', phSolubilityEvalHandler);
  return registry;
}
