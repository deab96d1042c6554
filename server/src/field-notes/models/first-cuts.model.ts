import { Field, Int, ObjectType } from '@nestjs/graphql';

import { FieldNoteModel } from './field-note.model.js';

@ObjectType('FirstCutsStep')
export class FirstCutsStepModel {
  @Field(() => Int, { description: '1-based place in the series' })
  position: number;

  @Field(() => FieldNoteModel)
  note: FieldNoteModel;
}

@ObjectType('FirstCuts')
export class FirstCutsModel {
  @Field(() => [FirstCutsStepModel])
  steps: FirstCutsStepModel[];

  @Field(() => Int, { description: 'Steps the signed-in reader has marked read (0 when signed out)' })
  readCount: number;
}
