import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { idParamsSchema, recipeRenameBodySchema, savedRecipeBodySchema } from '../schemas';
import { deleteRecipe, getRecipe, listRecipes, renameRecipe, saveRecipe } from '../services/bay-files';

export function recipesRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await listRecipes(actorOf(res)));
  });
  router.post('/', async (req, res) => {
    const body = savedRecipeBodySchema.parse(req.body);
    res.status(201).json(await saveRecipe(actorOf(res), body.name, body.recipe));
  });
  router.get('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getRecipe(actorOf(res), id));
  });
  router.patch('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await renameRecipe(actorOf(res), id, recipeRenameBodySchema.parse(req.body).name));
  });
  router.delete('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await deleteRecipe(actorOf(res), id);
    res.status(204).end();
  });
  return router;
}
