import type { Knex } from 'knex';
import type { FilmTypeRow, RecipeRow } from '../server/db/tables';

const SOURCE = "From memory of typical supplier sheets: follow your film supplier's instructions";
const SUPPLIER = 'Demo supplier';

type FilmTypeSeed = Omit<FilmTypeRow, 'id' | 'low_temp_film_type_id'> & { colours: [string, string][] };

const FILM_TYPES: FilmTypeSeed[] = [
  {
    name: 'Standard PU 90 µm', supplier: SUPPLIER, thickness_um: 90, wear_class: 1,
    cut_force_g: 90, cut_speed_mm_s: 300, blade_angle_deg: 45,
    notes: 'Everyday film for cotton and blends. Cut mirrored, shiny carrier side down.',
    colours: [['White', '#FFFFFF'], ['Black', '#1A1A1A'], ['Red', '#C8102E'], ['Royal blue', '#1F4BB4'], ['Navy', '#1B2A4A'], ['Yellow', '#FFD100']],
  },
  {
    name: 'Stretch PU 75 µm', supplier: SUPPLIER, thickness_um: 75, wear_class: 2,
    cut_force_g: 80, cut_speed_mm_s: 300, blade_angle_deg: 45,
    notes: 'Thin and elastic, for sportswear and jerseys. Peel hot.',
    colours: [['White', '#FFFFFF'], ['Black', '#1A1A1A'], ['Red', '#C8102E'], ['Royal blue', '#1F4BB4']],
  },
  {
    name: 'Low-temp PU 80 µm', supplier: SUPPLIER, thickness_um: 80, wear_class: 1,
    cut_force_g: 85, cut_speed_mm_s: 300, blade_angle_deg: 45,
    notes: 'For heat-sensitive fabrics: nylon, thin polyester, anything that scorches or bleeds.',
    colours: [['White', '#FFFFFF'], ['Black', '#1A1A1A']],
  },
  {
    name: 'Glitter 200 µm', supplier: SUPPLIER, thickness_um: 200, wear_class: 4,
    cut_force_g: 250, cut_speed_mm_s: 150, blade_angle_deg: 60,
    notes: 'Thick and abrasive: dulls the blade quickly, test cut before each run. Top layer only.',
    colours: [['Gold glitter', '#C9A227'], ['Silver glitter', '#BFC3C9'], ['Red glitter', '#B3122E']],
  },
  {
    name: 'Flock 450 µm', supplier: SUPPLIER, thickness_um: 450, wear_class: 3,
    cut_force_g: 220, cut_speed_mm_s: 150, blade_angle_deg: 60,
    notes: 'Soft raised pile. Nothing can be pressed on top of it. Keep the carrier on while weeding.',
    colours: [['Navy flock', '#1F2A44'], ['Black flock', '#141414'], ['White flock', '#F4F4F0']],
  },
];

const FABRICS = [
  { name: '100% cotton', max_temp_c: 205, notes: 'Tees and sweatshirts. Pre-press to drive out moisture.' },
  { name: '50/50 cotton-poly', max_temp_c: 165, notes: 'Hoodies and blended tees. Watch for shine on dark blends.' },
  { name: '100% polyester performance', max_temp_c: 150, notes: 'Jerseys and sports tops. Above the cap the dye can bleed into light film; use low-temp film when in doubt.' },
  { name: 'Cotton canvas', max_temp_c: 205, notes: 'Aprons and tote bags. Thick: firm pressure and a longer dwell.' },
  { name: 'Nylon', max_temp_c: 130, notes: 'Bags and jackets. Melts and glazes easily: low-temp film, short dwell, cover sheet.' },
];

type RecipeValues = Pick<RecipeRow, 'temp_c' | 'dwell_s' | 'pressure_class' | 'peel' | 'pre_press_s' | 'tack_s' | 'second_press_s' | 'notes'>;

function settings(temp_c: number, dwell_s: number, pressure_class: RecipeRow['pressure_class'], peel: RecipeRow['peel'], tack_s: number, notes = '', second_press_s: number | null = null): RecipeValues {
  return { temp_c, dwell_s, pressure_class, peel, pre_press_s: 3, tack_s, second_press_s, notes };
}

// Glitter and flock on nylon are left out on purpose: the press card must say so and point to the lead.
const RECIPES: Record<string, Record<string, RecipeValues>> = {
  'Standard PU 90 µm': {
    '100% cotton': settings(150, 12, 'medium', 'warm', 2, '', 3),
    '50/50 cotton-poly': settings(150, 12, 'medium', 'warm', 2),
    '100% polyester performance': settings(145, 10, 'medium', 'warm', 2, 'Light colours on dyed polyester may pick up the dye: test one first.'),
    'Cotton canvas': settings(155, 15, 'firm', 'warm', 3, '', 3),
    Nylon: settings(150, 10, 'medium', 'warm', 2, 'Too hot for nylon: the cap applies. Prefer Low-temp PU.'),
  },
  'Stretch PU 75 µm': {
    '100% cotton': settings(150, 10, 'medium', 'hot', 2),
    '50/50 cotton-poly': settings(150, 10, 'medium', 'hot', 2),
    '100% polyester performance': settings(145, 10, 'medium', 'hot', 2, 'Stretch the print gently after peeling to check adhesion.'),
    'Cotton canvas': settings(155, 12, 'firm', 'hot', 2),
    Nylon: settings(140, 8, 'medium', 'hot', 2, 'Above the nylon cap: prefer Low-temp PU.'),
  },
  'Low-temp PU 80 µm': {
    '100% cotton': settings(135, 12, 'medium', 'warm', 2),
    '50/50 cotton-poly': settings(130, 12, 'medium', 'warm', 2),
    '100% polyester performance': settings(130, 12, 'medium', 'warm', 2),
    'Cotton canvas': settings(135, 15, 'firm', 'warm', 3),
    Nylon: settings(125, 10, 'firm', 'cold', 2, 'Use a cover sheet. Remove any water-repellent coating first.', 3),
  },
  'Glitter 200 µm': {
    '100% cotton': settings(160, 15, 'firm', 'warm', 3, 'Ventilate: glitter gives off fumes at this heat.'),
    '50/50 cotton-poly': settings(160, 15, 'firm', 'warm', 3, 'Ventilate: glitter gives off fumes at this heat.'),
    '100% polyester performance': settings(160, 12, 'firm', 'warm', 3, 'Above the polyester cap: expect a warning, or use another film.'),
    'Cotton canvas': settings(165, 18, 'firm', 'warm', 3),
  },
  'Flock 450 µm': {
    '100% cotton': settings(160, 15, 'firm', 'cold', 0, 'Top layer only: nothing is pressed onto flock.'),
    '50/50 cotton-poly': settings(160, 15, 'firm', 'cold', 0, 'Top layer only: nothing is pressed onto flock.'),
    '100% polyester performance': settings(160, 15, 'firm', 'cold', 0, 'Above the polyester cap: expect a warning.'),
    'Cotton canvas': settings(165, 20, 'heavy', 'cold', 0),
  },
};

async function idsByName(knex: Knex, table: 'film_types' | 'fabrics'): Promise<Map<string, number>> {
  const rows: { id: number; name: string }[] = await knex(table).select('id', 'name');
  return new Map(rows.map((row) => [row.name, row.id]));
}

/** The film types with their colours, the fabrics, and a recipe book with one revision per recipe. */
export async function seed(knex: Knex): Promise<void> {
  await knex('film_types').insert(FILM_TYPES.map(({ colours: _colours, ...type }) => type));
  const filmTypeIds = await idsByName(knex, 'film_types');
  await knex('film_types')
    .where({ id: filmTypeIds.get('Standard PU 90 µm') })
    .update({ low_temp_film_type_id: filmTypeIds.get('Low-temp PU 80 µm') });

  await knex('films').insert(
    FILM_TYPES.flatMap((type) =>
      type.colours.map(([colour, colour_hex]) => ({ film_type_id: filmTypeIds.get(type.name)!, colour, colour_hex })),
    ),
  );

  await knex('fabrics').insert(FABRICS);
  const fabricIds = await idsByName(knex, 'fabrics');

  await knex('recipes').insert(
    Object.entries(RECIPES).flatMap(([filmType, byFabric]) =>
      Object.entries(byFabric).map(([fabric, values]) => ({
        film_type_id: filmTypeIds.get(filmType)!,
        fabric_id: fabricIds.get(fabric)!,
        ...values,
        source: SOURCE,
      })),
    ),
  );

  const owner = await knex('users').where({ role: 'owner' }).first('id');
  const recipes = await knex('recipes').select('*').orderBy('id');
  await knex('recipe_revisions').insert(
    recipes.map((recipe) => ({
      recipe_id: recipe.id,
      changed_by: owner?.id ?? null,
      changed_at: recipe.updated_at,
      before: null,
      after: JSON.stringify(recipe),
    })),
  );
}
