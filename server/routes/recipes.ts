import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { idParamsSchema, savedRecipeBodySchema } from '../schemas';
import { deleteRecipe, listRecipes, saveRecipe } from '../services/bay-files';

export function recipesRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await listRecipes(actorOf(res)));
  });
  router.post('/', async (req, res) => {
    const body = savedRecipeBodySchema.parse(req.body);
    res.status(201).json(await saveRecipe(actorOf(res), body.name, body.recipe));
  });
  router.delete('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await deleteRecipe(actorOf(res), id);
    res.status(204).end();
  });
  return router;
}
