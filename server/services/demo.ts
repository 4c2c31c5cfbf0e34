import { Shop, User } from '../models';
import { readScenario } from '../seed/demo';

let demoOwner: { email: string; shopName: string } | null = null;

/**
 * Whether the invented demo is loaded in this database: its owner's account exists, is active
 * and belongs to the demo shop. A real deployment has neither, so the sign-in screen shows the
 * demo sign-ins only where they work. One indexed lookup (users.email is unique).
 */
export async function isDemoLoaded(): Promise<boolean> {
  if (!demoOwner) {
    const scenario = readScenario();
    demoOwner = { email: scenario.owner.email, shopName: scenario.shop.name };
  }
  const owner = await User.findOne({
    where: { email: demoOwner.email, role: 'owner', active: true },
    include: [{ model: Shop, as: 'shop', attributes: ['name'], where: { name: demoOwner.shopName } }],
    attributes: ['id'],
  });
  return owner !== null;
}
